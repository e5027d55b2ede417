// Areas: the program's list of area codes. A household must name an active one; deactivating an area keeps the
// households already in it (and the reports' history), it only stops new sign-ups from choosing it.
import { startPage, report, t } from '/ui/shell.js';
import { api } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';

function row(area) {
  const id = `area-${area.code}`;
  const status = el('span', { class: 'status', role: 'status', 'aria-live': 'polite' });
  const name = el('input', { id: `${id}-name`, value: area.name, maxlength: '100', required: true, autocomplete: 'off' });
  const active = el('input', { id: `${id}-active`, type: 'checkbox', checked: area.active, 'aria-label': t('areas.activeOf', { code: area.code }) });
  const save = el('button', { type: 'button', class: 'quiet', 'aria-label': t('areas.saveFor', { code: area.code }), onclick: async () => {
    try {
      const changed = await api(`/api/areas/${encodeURIComponent(area.code)}`, { method: 'PUT', body: { name: name.value, active: active.checked } });
      say(status, changed.active ? t('areas.savedActive') : t('areas.savedInactive'));
    } catch (error) { report(error, status); }
  } }, t('areas.save'));
  return el('tr', {},
    el('td', { 'data-label': t('areas.code') }, el('span', { class: 'code' }, area.code)),
    el('td', { 'data-label': t('areas.name') }, el('label', { for: name.id, class: 'visually-hidden' }, t('areas.nameOf', { code: area.code })), name),
    el('td', { 'data-label': t('areas.active') }, el('label', { class: 'check', for: active.id }, active, t('areas.active'))),
    el('td', {}, save, ' ', status));
}

async function load() {
  const areas = await api('/api/areas');
  say(byId('status'), areas.length ? t('areas.count', { count: areas.length, active: areas.filter(a => a.active).length }) : t('areas.none'),
    areas.length ? 'ok' : 'warn');
  byId('areas').replaceChildren(areas.length ? el('table', { class: 'stack' },
    el('caption', {}, t('areas.caption')),
    el('thead', {}, el('tr', {}, ['areas.code', 'areas.name', 'areas.active', 'areas.change'].map(k => el('th', { scope: 'col' }, t(k))))),
    el('tbody', {}, areas.map(row))) : '');
}

async function add(event) {
  event.preventDefault();
  const status = byId('add-status');
  try {
    const area = await api('/api/areas', { method: 'POST', body: { code: byId('add-code').value, name: byId('add-name').value } });
    say(status, t('areas.added', { code: area.code, name: area.name }));
    byId('add-form').reset();
    await load();
  } catch (error) { report(error, status); }
}

startPage({
  area: 'coordinator',
  run: async () => {
    byId('add-form').addEventListener('submit', add);
    await load();
  },
});
