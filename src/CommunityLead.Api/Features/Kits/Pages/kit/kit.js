// One kit for the coordinator: what happened when, its bottles, results and their meaning, and its letter (the
// words shown on the page, the PDF, marking it sent, every letter issued). Reached from Today and the kit lists.
import { startPage, report, t } from '/ui/shell.js';
import { api, ApiError, download } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { formatDate } from '/ui/i18n.js';
import { letterWords } from '/ui/result/words.js';
import { bottles, meaningView, results, timeline, word } from './parts.js';
import { showCollection } from './collection.js';

const HAS_LETTER = ['interpreted', 'letter-sent', 'closed'];
const code = new URLSearchParams(location.search).get('code') || '';

async function interpretation() {
  try {
    return await api(`/api/kits/${encodeURIComponent(code)}/interpretation`);
  } catch (error) {
    if (error instanceof ApiError && error.status === 409) return null; // no results yet
    throw error;
  }
}

/** A letter's words on the page; held: a letter not released yet, framed and captioned so nobody takes it for one to mail. */
function showWords(words, held = false) {
  const box = byId('letter-words');
  box.lang = words.language;
  box.replaceChildren(...letterWords(words, { titleId: 'preview-title', level: 3 }));
  byId('letter-held').hidden = !held;
  byId('preview-caption').textContent = t(held ? 'kit.heldCaption' : 'kit.previewCaption');
  byId('letter-preview').classList.toggle('held', held);
  byId('letter-preview').hidden = false;
}

async function preview(letter) {
  showWords(await api(`/api/letters/${letter.id}/words`));
}

/**
 * The letter as it would be printed now, in the chosen language, when it is held (an urgent or implausible item open
 * on Today): no letter is issued then, so there are no stored words to show. Null when the letter is released.
 */
async function heldDraft() {
  const lang = byId('letter-language').value;
  const draft = await api(`/api/kits/${encodeURIComponent(code)}/letter/words${lang ? `?lang=${lang}` : ''}`);
  return draft.released ? null : draft;
}

function letterRows(letters) {
  const status = byId('letter-status');
  if (!letters.length) return el('p', {}, t('kit.noLetters'));
  return el('table', { class: 'stack' },
    el('caption', {}, t('kit.lettersCaption', { count: letters.length })),
    el('thead', {}, el('tr', {}, ['kit.letterNumber', 'kit.letterLanguage', 'kit.issuedAt', 'kit.sentAt', 'kit.letterFile'].map(k => el('th', { scope: 'col' }, t(k))))),
    el('tbody', {}, letters.map(l => el('tr', {},
      el('td', { 'data-label': t('kit.letterNumber') }, String(l.id), el('span', { class: 'hint' }, word('letterKind', l.kind))),
      el('td', { 'data-label': t('kit.letterLanguage') }, word('language', l.language)),
      el('td', { 'data-label': t('kit.issuedAt') }, formatDate(l.issuedAt)),
      el('td', { 'data-label': t('kit.sentAt') }, l.sentAt ? formatDate(l.sentAt) : t('kit.notSent')),
      el('td', { 'data-label': t('kit.letterFile') },
        el('button', { type: 'button', class: 'quiet', 'aria-label': t('kit.showWordsOf', { id: l.id }), onclick: () => preview(l).catch(e => report(e, status)) }, t('kit.showWords')), ' ',
        el('button', { type: 'button', class: 'quiet', 'aria-label': t('kit.downloadOf', { id: l.id }), onclick: () =>
          download(`/api/letters/${l.id}`, `letter-${code}-${l.id}.pdf`).catch(e => report(e, status)) }, t('kit.download')))))));
}

async function getLetter() {
  const status = byId('letter-status');
  const lang = byId('letter-language').value;
  try {
    const response = await download(`/api/kits/${encodeURIComponent(code)}/letter${lang ? `?lang=${lang}` : ''}`, `letter-${code}.pdf`);
    const held = response.headers.get('X-Letter-Released') === 'false';
    say(status, held ? t('kits.letterPreview') : t('kit.letterRecorded'), held ? 'warn' : 'ok');
    await load({ keepStatus: true });
  } catch (error) { report(error, status); }
}

async function markSent() {
  const status = byId('letter-status');
  try {
    await api(`/api/kits/${encodeURIComponent(code)}/letter/sent`, { method: 'POST', body: {} });
    say(status, t('kits.letterSent', { code }));
    await load({ keepStatus: true });
  } catch (error) { report(error, status); }
}

async function load({ keepStatus = false } = {}) {
  const kit = await api(`/api/kits/${encodeURIComponent(code)}`);
  // Only an interpreted kit's letter can be held (a corrected result takes a sent kit back through interpreted).
  const [letters, meaning, held] = await Promise.all([
    HAS_LETTER.includes(kit.state) ? api(`/api/kits/${encodeURIComponent(kit.code)}/letters`) : [], interpretation(),
    kit.state === 'interpreted' ? heldDraft() : null]);
  byId('kit-title').replaceChildren(t('kit.titleOf'), ' ', el('span', { class: 'code' }, kit.code));
  byId('kit-summary').replaceChildren(el('span', {}, word('kind', kit.kind), ' · ', el('strong', { id: 'kit-state' }, word('state', kit.state)),
    kit.stateReason ? ` (${kit.stateReason})` : '',
    kit.householdId ? [' · ', el('a', { href: `/ui/households/?id=${encodeURIComponent(kit.householdId)}` }, t('kit.household'))] : '',
    kit.replacedByCode ? [' · ', el('a', { href: `?code=${encodeURIComponent(kit.replacedByCode)}` }, t('kit.replacedBy', { code: kit.replacedByCode }))] : ''));
  byId('timeline').replaceChildren(...timeline(kit, letters));
  byId('bottles').replaceChildren(bottles(kit));
  byId('results').replaceChildren(results(meaning));
  byId('meaning').replaceChildren(meaningView(meaning));
  byId('letters').replaceChildren(letterRows(letters));
  byId('letter-get').disabled = !HAS_LETTER.includes(kit.state);
  byId('letter-sent').hidden = kit.state !== 'interpreted' || !letters.length;
  if (!keepStatus) say(byId('letter-status'), HAS_LETTER.includes(kit.state) ? '' : t('kit.noLetterYet'), 'warn');
  byId('letter-language').onchange = held ? () => heldDraft().then(d => d && showWords(d, true)).catch(e => report(e, byId('letter-status'))) : null;
  if (held) showWords(held, true);
  else if (letters.length) await preview(letters[letters.length - 1]);
  showCollection(kit, async message => {
    await load();
    say(byId('status'), message);
    byId('bottles-title').scrollIntoView();
  });
}

startPage({
  area: 'coordinator',
  run: async () => {
    if (!code) { say(byId('status'), t('kit.noCode'), 'error'); return; }
    byId('letter-get').addEventListener('click', getLetter);
    byId('letter-sent').addEventListener('click', markSent);
    try {
      await load();
    } catch (error) {
      if (error instanceof ApiError && error.status === 404) { say(byId('status'), t('kits.unknown', { code }), 'error'); return; }
      throw error;
    }
  },
});
