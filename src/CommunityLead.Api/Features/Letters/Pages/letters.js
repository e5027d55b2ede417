// Letters: the day's mailing. One ZIP holds every released letter, a manifest and one combined PDF to print; kits
// whose letter is held (an urgent or implausible result not yet resolved on Today) get none. Once the envelopes
// are out, the coordinator ticks them and marks them sent: nothing is marked sent without that.
import { startPage, report, t, problemText } from '/ui/shell.js';
import { api, download } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { formatDate } from '/ui/i18n.js';

const HOLDS_LETTER = ['urgent', 'implausible'];

function row(kit, held) {
  const id = `sent-${kit.code}`;
  return el('tr', { 'data-code': kit.code },
    el('td', { 'data-label': held ? null : t('letters.sent') }, held ? '' : el('input', { type: 'checkbox', id, name: 'sent', value: kit.code, 'aria-label': t('letters.tick', { code: kit.code }) })),
    el('td', { 'data-label': t('kits.code') }, el('a', { class: 'code', href: `/ui/kits/kit/?code=${encodeURIComponent(kit.code)}` }, kit.code)),
    el('td', { 'data-label': t('households.area') }, kit.areaCode),
    el('td', { 'data-label': t('kits.updated') }, formatDate(kit.updatedAt)),
    el('td', { 'data-label': t('letters.letter'), class: 'outcome' }, held
      ? el('span', { class: 'tag urgent' }, t('letters.held'))
      : el('span', { class: 'tag' }, t('letters.ready'))));
}

// The most the kit list gives in one page (KitQueries): a mailing can be longer, so it is read page by page.
const PAGE_SIZE = 200;

/**
 * Every interpreted kit, oldest change first. A kit changed while the pages are read moves to the end of the list
 * and may come twice: it is kept once.
 */
async function interpretedKits() {
  const kits = new Map();
  for (let page = 1; ; page++) {
    const answer = await api(`/api/kits?state=interpreted&pageSize=${PAGE_SIZE}&page=${page}`);
    for (const kit of answer.items) if (!kits.has(kit.code)) kits.set(kit.code, kit);
    if (answer.items.length < PAGE_SIZE || page * PAGE_SIZE >= answer.total) return [...kits.values()];
  }
}

async function load() {
  const [kits, attention] = await Promise.all([interpretedKits(), api('/api/attention/kits')]);
  const held = new Set(attention.filter(a => a.reasons.some(r => HOLDS_LETTER.includes(r.reason))).map(a => a.kitCode));
  say(byId('status'), t('letters.count', { count: kits.length, held: kits.filter(k => held.has(k.code)).length }));
  byId('ready').replaceChildren(kits.length ? el('table', { class: 'stack' },
    el('caption', {}, t('letters.readyCaption')),
    el('thead', {}, el('tr', {}, el('th', { scope: 'col' }, t('letters.sent')),
      ['kits.code', 'households.area', 'kits.updated', 'letters.letter'].map(k => el('th', { scope: 'col' }, t(k))))),
    el('tbody', {}, kits.map(k => row(k, held.has(k.code))))) : '');
  byId('mark').hidden = !kits.some(k => !held.has(k.code));
}

async function batch() {
  const status = byId('batch-status');
  try {
    await download('/api/letters/batch?combined=true', 'letters.zip', { method: 'POST' });
    say(status, t('letters.downloaded'));
  } catch (error) { report(error, status); }
}

async function markSent(event) {
  event.preventDefault();
  const ticked = [...document.querySelectorAll('input[name=sent]:checked')].map(i => i.value);
  if (!ticked.length) { say(byId('status'), t('letters.tickFirst'), 'error'); return; }
  let done = 0;
  for (const code of ticked) {
    const cell = document.querySelector(`tr[data-code="${code}"] .outcome`);
    try {
      await api(`/api/kits/${encodeURIComponent(code)}/letter/sent`, { method: 'POST', body: {} });
      cell.replaceChildren(el('span', { class: 'tag' }, t('state.letter-sent')));
      document.getElementById(`sent-${code}`).remove();
      done++;
    } catch (error) {
      // A letter not yet printed (no batch since the result came in) is refused: said on its row, the others go on.
      cell.replaceChildren(el('span', { class: 'status error' }, problemText(error)));
    }
  }
  say(byId('status'), t('letters.marked', { count: done, of: ticked.length }), done === ticked.length ? 'ok' : 'warn');
}

startPage({
  area: 'coordinator',
  run: async () => {
    byId('batch').addEventListener('click', batch);
    byId('sent-form').addEventListener('submit', markSent);
    await load();
  },
});
