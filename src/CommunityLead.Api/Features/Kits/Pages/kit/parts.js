// The kit page's read-only parts: the timeline (the kit's history with its letters), the bottles with their
// standing time and flags, the results and what they mean. Each takes the API's answer and returns elements.
import { englishOnly, fromService, t } from '/ui/shell.js';
import { el } from '/ui/dom.js';
import { formatDate, formatNumber, language } from '/ui/i18n.js';

/** A word for a value of the API (an action, a band, a flag), or the value itself when the pages have none. */
export function word(prefix, value) {
  const key = `${prefix}.${value}`;
  const text = t(key);
  return text === key ? value : text;
}

function bottleName(s) {
  return [word('bottle', s.bottle), s.position ? ` ${s.position}` : '', s.location ? ` · ${word('location', s.location)}` : ''].join('');
}

/** Everything that happened, oldest first: the audit trail's kit entries and each letter issued and sent. */
export function timeline(kit, letters) {
  const events = (kit.history || []).map(h => {
    const what = word('action', h.action);
    // Each named action says where the kit went ("Received"): the new state only beside an action without a name.
    const to = h.to && what === h.action ? word('state', h.to) : null;
    return { at: h.at, what, to, note: h.reason };
  });
  if (!kit.history) events.push({ at: kit.issuedAt, what: word('action', 'issue') });
  for (const l of letters) {
    events.push({ at: l.issuedAt, what: t('kit.letterIssued', { id: l.id, language: word('language', l.language) }) });
  }
  events.sort((a, b) => new Date(a.at) - new Date(b.at));
  return events.map(e => el('li', {},
    el('time', { datetime: e.at }, formatDate(e.at)), ' ',
    el('strong', {}, e.what), e.to ? ` → ${e.to}` : '',
    e.note ? el('span', { class: 'hint' }, e.note) : null));
}

/**
 * A collection flag: its severity, and the service's sentence (English only). On a page in another language the
 * flag's kind comes first in that language, so the sentence's gist is never only in English.
 */
function flag(f) {
  return [el('span', { class: `tag ${f.severity}` }, word('severity', f.severity)), ' ',
    language() === 'en' ? null : [el('strong', {}, word('collectionFlag', f.code)), ': '], fromService(f.message)];
}

export function bottles(kit) {
  if (!kit.samples.length) return el('p', {}, t('kit.noBottles'));
  const flagsOf = s => kit.flags.filter(f => f.bottle === s.bottle && (f.position ?? null) === (s.position ?? null));
  const general = kit.flags.filter(f => !f.bottle);
  return el('div', {},
    el('ul', { class: 'bottles' }, kit.samples.map(s => el('li', {},
      el('strong', {}, bottleName(s)), ' · ', formatDate(s.collectedAt),
      s.standingMinutes != null ? ` · ${t('kit.stood', { hours: formatNumber(s.standingMinutes / 60, 1) })}` : '',
      s.flushSeconds != null ? ` · ${t('kit.flushed', { seconds: s.flushSeconds })}` : '',
      s.tap ? ` · ${word('tap', s.tap)}` : '',
      flagsOf(s).map(f => el('div', {}, flag(f)))))),
    general.length ? el('ul', { class: 'reasons' }, general.map(f => el('li', {}, flag(f)))) : null,
    kit.flags.length ? englishOnly() : null);
}

function value(f) {
  const shown = f.belowReportingLimit ? t('kit.belowLimit', { value: formatNumber(f.value, 1) }) : formatNumber(f.value, f.value < 10 ? 2 : 1);
  return `${shown} ${f.unit}`;
}

export function results(meaning) {
  if (!meaning) return el('p', {}, t('kit.noResults'));
  return el('div', {}, el('div', { class: 'table-wrap', tabindex: '0', role: 'region', 'aria-labelledby': 'results-title' }, el('table', { class: 'stack' },
    el('thead', {}, el('tr', {}, ['kit.sample', 'kit.analyte', 'kit.value', 'kit.level', 'kit.band'].map(k => el('th', { scope: 'col' }, t(k))))),
    el('tbody', {}, meaning.findings.map(f => el('tr', {},
      el('td', { 'data-label': t('kit.sample') }, bottleName(f)),
      el('td', { 'data-label': t('kit.analyte') }, word('analyte', f.analyte)),
      el('td', { 'data-label': t('kit.value'), class: 'num' }, value(f)),
      el('td', { 'data-label': t('kit.level') }, f.levelValue != null ? `${formatNumber(f.levelValue, 1)} ${f.unit}` : '—',
        // The profiles word their levels in English only: marked so, and said so under the table.
        f.levelMeaning ? fromService(f.levelMeaning, 'span', { class: 'hint' }) : null),
      el('td', { 'data-label': t('kit.band') }, el('span', { class: `tag ${f.band}` }, word('band', f.band)))))))),
    meaning.findings.some(f => f.levelMeaning) ? englishOnly('kit.levelsInEnglish') : null);
}

export function meaningView(meaning) {
  if (!meaning) return el('p', {}, t('kit.noInterpretation'));
  const lang = language();
  return el('div', {},
    meaning.provisional ? el('p', { class: 'status warn' }, t('kit.provisional')) : null,
    el('p', {}, t('kit.bandIs'), ' ', el('span', { class: `tag ${meaning.band}` }, word('band', meaning.band)),
      meaning.pattern ? ` · ${word('pattern', meaning.pattern)}` : '',
      meaning.interpretedAt ? el('span', { class: 'hint' }, t('kit.interpretedAt', {
        when: formatDate(meaning.interpretedAt), profile: `${meaning.profile.id} v${meaning.profile.version}` })) : null),
    meaning.flags.length ? el('p', {}, meaning.flags.map(f => el('span', { class: `tag ${f}` }, word('flag', f)))) : null,
    meaning.implausible.length ? el('p', { class: 'status error' }, t('kit.implausible', { count: meaning.implausible.length })) : null,
    meaning.validity.length ? el('ul', { class: 'reasons' }, meaning.validity.map(v => el('li', {},
      language() === 'en' ? null : [el('strong', {}, word('validity', v.code)), ': '], fromService(v.reason)))) : null,
    meaning.validity.length ? englishOnly() : null,
    el('h3', {}, t('kit.messages')),
    el('ul', { class: 'reasons' }, meaning.messages.map(m => el('li', { lang }, lang === 'es' ? m.es : m.en))));
}
