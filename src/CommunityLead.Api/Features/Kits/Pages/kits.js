// Kits: receipt by typing or scanning (a handheld scanner types the code and Enter, many in a row, each one
// confirmed in an assertive live region), issuing a kit and printing its label, label sheets, one kit's state and
// letter, and the work queue by state. One kit's details are on its own page (kit/).
import { startPage, report, t, problemText } from '/ui/shell.js';
import { api, ApiError, download } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { formatDate } from '/ui/i18n.js';
import { nowWithOffset } from '/ui/times.js';

const STATES = ['issued', 'collected', 'received', 'analyzed', 'interpreted', 'letter-sent', 'closed', 'cancelled', 'lost', 'rejected'];

/** The check-character refusal in the page's language; any other refusal as the service worded it. */
function codeProblem(error, typed) {
  const fields = error instanceof ApiError ? Object.values(error.problem.errors || {}).flat().join(' ') : '';
  if (/check character/i.test(fields)) return t('kits.mistyped', { code: typed });
  if (error instanceof ApiError && error.status === 404) return t('kits.unknown', { code: typed });
  return problemText(error);
}

async function receive(event) {
  event.preventDefault();
  const input = byId('receipt-code');
  const typed = input.value.trim();
  if (!typed) return;
  input.value = '';
  input.focus();
  const status = byId('receipt-status');
  try {
    const kit = await api(`/api/kits/${encodeURIComponent(typed)}/receipt`, { method: 'POST', body: { receivedAt: nowWithOffset() } });
    const line = t('kits.received', { code: kit.code });
    say(status, line);
    byId('receipt-log').prepend(el('li', {}, line));
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return report(error, status);
    const line = codeProblem(error, typed);
    say(status, line, 'error');
    byId('receipt-log').prepend(el('li', { class: 'status error' }, line));
  }
}

let household = null;

async function chooseHousehold(id) {
  const h = await api(`/api/households/${encodeURIComponent(id)}`);
  household = h;
  byId('issue-household').textContent = t('kits.issueTo', { name: h.name, address: h.address.line1 });
  byId('issue').disabled = false;
}

async function issue(event) {
  event.preventDefault();
  const status = byId('issue-status');
  try {
    const kit = await api('/api/kits', { method: 'POST', body: { householdId: household.id, kind: byId('issue-kind').value } });
    say(status, t('kits.issued', { code: kit.code, name: household.name }));
    status.append(' ', el('a', { href: `kit/?code=${encodeURIComponent(kit.code)}` }, t('kits.openKit')));
    const label = byId('issued-label');
    label.hidden = false;
    label.onclick = () => download(`/api/kits/labels?stock=${byId('labels-stock').value}&codes=${encodeURIComponent(kit.code)}`, `kit-label-${kit.code}.pdf`)
      .catch(e => report(e, status));
    byId('labels-codes').value = [byId('labels-codes').value.trim(), kit.code].filter(Boolean).join('\n');
  } catch (error) {
    report(error, status);
  }
}

async function labels(event) {
  event.preventDefault();
  const status = byId('labels-status');
  const codes = byId('labels-codes').value.split(/[\s,]+/).filter(Boolean);
  try {
    await download(`/api/kits/labels?stock=${byId('labels-stock').value}&codes=${encodeURIComponent(codes.join(','))}`, 'kit-labels.pdf');
    say(status, t('kits.labelsReady', { count: codes.length }));
  } catch (error) {
    report(error, status);
  }
}

/** One kit opens on its own page (kit/), where its timeline, results and letter are. */
function openKit(typed) {
  location.assign(`kit/?code=${encodeURIComponent(typed.trim())}`);
}

async function queue(event) {
  event?.preventDefault();
  const status = byId('queue-status');
  try {
    const page = await api(`/api/kits?state=${byId('queue-state').value}&pageSize=50`);
    say(status, t('kits.queueCount', { count: page.total }));
    byId('queue').replaceChildren(page.items.length ? el('table', {},
      el('caption', {}, t(`state.${byId('queue-state').value}`)),
      el('thead', {}, el('tr', {}, ['kits.code', 'kits.kind', 'households.area', 'kits.updated', 'kits.flags'].map(k => el('th', { scope: 'col' }, t(k))))),
      el('tbody', {}, page.items.map(k => el('tr', {},
        el('td', {}, el('a', { class: 'code', href: `kit/?code=${encodeURIComponent(k.code)}` }, k.code)),
        el('td', {}, t(`kind.${k.kind}`)), el('td', {}, k.areaCode), el('td', {}, formatDate(k.updatedAt)),
        el('td', { class: 'num' }, k.flagCount))))) : '');
  } catch (error) {
    report(error, status);
  }
}

startPage({
  area: 'coordinator',
  run: async () => {
    byId('receipt-form').addEventListener('submit', receive);
    byId('issue-form').addEventListener('submit', issue);
    byId('labels-form').addEventListener('submit', labels);
    byId('lookup-form').addEventListener('submit', e => { e.preventDefault(); openKit(byId('lookup-code').value); });
    byId('queue-form').addEventListener('submit', queue);
    byId('queue-state').replaceChildren(...STATES.map(s => el('option', { value: s }, t(`state.${s}`))));
    const query = new URLSearchParams(location.search);
    if (query.get('household')) await chooseHousehold(query.get('household'));
    // An older link to one kit (?code=) opens its page.
    if (query.get('code')) { location.replace(`kit/?code=${encodeURIComponent(query.get('code'))}`); return; }
    byId('receipt-code').focus();
  },
});
