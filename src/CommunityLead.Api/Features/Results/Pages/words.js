// A letter's words as the page shows them: its facts, its result table and its sections. Used by the household's
// result page and by the coordinator's kit page (the letter's preview), so both read exactly as the letter does.
import { el } from '/ui/dom.js';

/**
 * The result table stacks on a phone: each cell carries its column's title (data-label), which the style sheet
 * shows beside the value when the columns no longer fit, so no column is cut off.
 */
function resultTable(results, labelledBy) {
  return el('div', { class: 'table-wrap', tabindex: '0', role: 'region', 'aria-labelledby': labelledBy }, el('table', { class: 'stack' },
    el('thead', {}, el('tr', {}, results.headers.map(h => el('th', { scope: 'col' }, h)))),
    el('tbody', {}, results.rows.map(r => el('tr', {}, r.map((c, i) => el('td', { 'data-label': results.headers[i] ?? '' }, c)))))));
}

/** The letter's words under a heading with the given id (level 2 on the result page, 3 inside the kit page). */
export function letterWords(result, { titleId, level = 2 }) {
  const sub = `h${level + 1}`;
  return [
    el(`h${level}`, { id: titleId, tabindex: '-1' }, result.title),
    el('dl', {}, result.facts.map(f => [el('dt', {}, f.label), el('dd', {}, f.value)])),
    result.results ? resultTable(result.results, titleId) : null,
    result.results?.note ? el('p', { class: 'hint' }, result.results.note) : null,
    ...result.sections.map(s => el('section', {},
      el(sub, {}, s.heading),
      s.numbered ? el('ol', {}, s.paragraphs.map(p => el('li', {}, p))) : s.paragraphs.map(p => el('p', {}, p)))),
    el('p', {}, result.closing),
  ];
}
