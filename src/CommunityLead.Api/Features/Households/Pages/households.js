// Households: find a home by name, phone, email or address; sign one up; edit one (a stale edit is refused by the
// service with 412, shown as "someone changed this meanwhile" with a way to load their change).
import { startPage, report, t } from '/ui/shell.js';
import { api, ApiError } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { localInput, withOffset } from '/ui/times.js';

const form = byId('household-form');
let editing = null; // { id, etag } while editing, null while signing up

function field(name) { return form.querySelector(`[data-field="${name}"]`); }

function fill(h) {
  for (const input of form.querySelectorAll('[data-field]')) {
    const path = input.dataset.field.split('.');
    const value = path.reduce((o, k) => (o == null ? undefined : o[k]), h);
    if (input.type === 'checkbox') input.checked = Boolean(value);
    else if (input.type === 'datetime-local') input.value = value ? localInput(value) : '';
    else input.value = value ?? '';
  }
}

function read() {
  const text = name => field(name).value.trim() || null;
  return {
    name: text('name'),
    address: { line1: text('address.line1'), line2: text('address.line2'), city: text('address.city'),
      region: text('address.region'), postalCode: text('address.postalCode') },
    phone: text('phone'), email: text('email'), language: field('language').value,
    consentVersion: text('consentVersion'),
    consentGivenAt: field('consentGivenAt').value ? withOffset(field('consentGivenAt').value) : null,
    areaCode: text('areaCode'), waterSource: field('waterSource').value,
    yearBuilt: field('yearBuilt').value ? Number(field('yearBuilt').value) : null,
    serviceLine: field('serviceLine').value,
    childUnder6: field('childUnder6').checked, pregnant: field('pregnant').checked, filterInUse: field('filterInUse').checked,
  };
}

function clearErrors() {
  form.querySelectorAll('.field-error').forEach(e => e.remove());
  form.querySelectorAll('[aria-invalid]').forEach(e => { e.removeAttribute('aria-invalid'); e.removeAttribute('aria-describedby'); });
}

/** Puts each of the service's field messages under its field, and the first wrong field in focus. */
function showErrors(errors) {
  let first = null;
  for (const [name, messages] of Object.entries(errors || {})) {
    const input = field(name) || field(name.split('.')[0]);
    if (!input) continue;
    const id = `${input.id}-error`;
    input.setAttribute('aria-invalid', 'true');
    input.setAttribute('aria-describedby', id);
    input.after(el('span', { class: 'hint field-error status error', id }, messages.join(' ')));
    first ??= input;
  }
  first?.focus();
}

function open(title, household) {
  clearErrors();
  say(byId('form-status'), '');
  byId('reload').hidden = true;
  byId('form-title').textContent = title;
  fill(household);
  byId('kits-line').replaceChildren();
  form.hidden = false;
  byId('form-title').focus();
}

async function edit(id) {
  const response = await api(`/api/households/${id}`, { raw: true });
  const household = await response.json();
  editing = { id, etag: response.headers.get('ETag') };
  open(t('households.editTitle', { name: household.name }), household);
  byId('kits-line').replaceChildren(
    t('households.kitCount', { count: household.kits.length }), ' ',
    el('a', { href: `/ui/kits/?household=${id}` }, t('households.issueKit')));
}

function signUp() {
  editing = null;
  open(t('households.newTitle'), {
    language: 'en', waterSource: 'public', serviceLine: 'unknown', consentVersion: '', consentGivenAt: new Date().toISOString(),
  });
}

async function save(event) {
  event.preventDefault();
  clearErrors();
  const status = byId('form-status');
  try {
    if (editing) {
      await api(`/api/households/${editing.id}`, { method: 'PUT', body: read(), headers: { 'If-Match': editing.etag } });
      await edit(editing.id);
      say(byId('form-status'), t('households.saved'));
    } else {
      const created = await api('/api/households', { method: 'POST', body: read() });
      await edit(created.id);
      say(byId('form-status'), t('households.signedUp'));
    }
  } catch (error) {
    if (error instanceof ApiError && error.status === 412) {
      say(status, t('households.stale'), 'warn');
      byId('reload').hidden = false;
      byId('reload').focus();
      return;
    }
    report(error, status);
    if (error instanceof ApiError && error.status === 400) showErrors(error.problem.errors);
  }
}

async function search(event) {
  event?.preventDefault();
  const status = byId('status');
  const text = byId('search').value.trim();
  try {
    const page = await api(`/api/households?pageSize=50&search=${encodeURIComponent(text)}`);
    say(status, t('households.found', { count: page.total }));
    if (!page.items.length) { byId('results').replaceChildren(); return; }
    byId('results').replaceChildren(el('table', {},
      el('caption', {}, t('households.resultsCaption')),
      el('thead', {}, el('tr', {}, ['households.name', 'households.phone', 'households.line1', 'households.postalCode', 'households.area', 'households.kits', 'households.actions']
        .map(k => el('th', { scope: 'col' }, t(k))))),
      el('tbody', {}, page.items.map(h => el('tr', {},
        el('td', {}, h.name), el('td', {}, h.phone || '—'), el('td', {}, `${h.addressLine1}, ${h.city}`),
        el('td', {}, h.postalCode), el('td', {}, h.areaCode), el('td', { class: 'num' }, h.kits),
        el('td', {},
          el('button', { type: 'button', class: 'quiet', onclick: () => edit(h.id).catch(e => report(e, status)),
            'aria-label': t('households.editFor', { name: h.name }) }, t('households.edit')), ' ',
          el('a', { href: `/ui/kits/?household=${h.id}`, 'aria-label': t('households.issueKitFor', { name: h.name }) }, t('households.issueKit'))))))));
  } catch (error) {
    report(error, status);
  }
}

startPage({
  area: 'coordinator',
  run: async () => {
    byId('search-form').addEventListener('submit', search);
    byId('new').addEventListener('click', signUp);
    form.addEventListener('submit', save);
    byId('cancel').addEventListener('click', () => { form.hidden = true; byId('search').focus(); });
    byId('reload').addEventListener('click', () => edit(editing.id).then(() => say(byId('form-status'), t('households.reloaded'), 'warn')));
    const id = new URLSearchParams(location.search).get('id');
    if (id) await edit(id);
  },
});
