// Today: the kits that need a person, one card per kit with every reason, the household's name and phone, most
// urgent first. A note resolves all the kit's open reasons (for an urgent result, that releases its letter).
import { startPage, report, t, englishOnly, fromService } from '/ui/shell.js';
import { api } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { formatDate } from '/ui/i18n.js';

const HOLDS_LETTER = ['urgent', 'implausible'];

function card(kit, index) {
  const id = `kit-${index}`;
  const status = el('p', { class: 'status', role: 'status', 'aria-live': 'polite' });
  const note = el('textarea', { id: `${id}-note`, name: 'note', required: true, maxlength: '500' });
  const form = el('form', { 'aria-label': t('today.resolveFor', { code: kit.kitCode }) },
    el('label', { for: `${id}-note` }, t('today.note'), el('span', { class: 'hint' }, t('today.noteHint'))),
    note,
    HOLDS_LETTER.includes(kit.mostUrgent) ? el('p', { class: 'hint' }, t('today.releases')) : null,
    el('button', { type: 'submit' }, t('today.resolve')),
    status);
  const article = el('article', { class: `panel kit-card ${kit.mostUrgent}`, 'aria-labelledby': `${id}-title` },
    el('header', {},
      el('h2', { id: `${id}-title` }, kit.householdName),
      el('span', {}, t('today.kit'), ' ', el('a', { class: 'code', href: `/ui/kits/kit/?code=${encodeURIComponent(kit.kitCode)}` }, kit.kitCode)),
      kit.phone
        ? el('a', { href: `tel:${kit.phone.replace(/[^0-9+]/g, '')}` }, t('today.call', { phone: kit.phone }))
        : el('span', {}, t('today.noPhone')),
      el('span', { class: 'hint' }, t(`language.${kit.language}`))),
    el('ul', { class: 'reasons' }, kit.reasons.map(r => el('li', {},
      el('span', { class: `tag ${r.reason}` }, t(`flag.${r.reason}`)), ' ', fromService(r.detail), ' ',
      el('span', { class: 'hint' }, t('today.raised', { when: formatDate(r.raisedAt) }))))),
    form);
  form.addEventListener('submit', async event => {
    event.preventDefault();
    try {
      for (const reason of kit.reasons) {
        await api(`/api/attention/${reason.id}/resolve`, { method: 'POST', body: { note: note.value } });
      }
      article.remove();
      say(byId('status'), t('today.resolved', { code: kit.kitCode, name: kit.householdName }));
      byId('main').focus();
      if (!byId('kits').children.length) showEmpty();
    } catch (error) {
      report(error, status);
    }
  });
  return article;
}

function showEmpty() {
  byId('kits').replaceChildren(el('p', { class: 'panel' }, t('today.empty')));
}

startPage({
  area: 'coordinator',
  run: async () => {
    const kits = await api('/api/attention/kits');
    // Each reason's sentence is the service's, in English: said once above the cards.
    const note = kits.length ? englishOnly('today.reasonsInEnglish') : null;
    if (note) byId('kits').before(note);
    byId('kits').replaceChildren(...kits.map(card));
    if (!kits.length) showEmpty();
  },
});
