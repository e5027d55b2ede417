// A batch's QC figures, each beside its window and verdict: the lab's upload page and the coordinator's held
// batches show the same table.
import { t } from '/ui/shell.js';
import { el } from '/ui/dom.js';
import { formatNumber } from '/ui/i18n.js';

/** A window with both ends as "low – high"; with one end as a bound ("≥ 1", "≤ 0.5"); none for a figure only reported. */
function bounds(c) {
  if (c.low != null && c.high != null) return `${formatNumber(c.low, 2)} – ${formatNumber(c.high, 2)}`;
  if (c.low != null) return `≥ ${formatNumber(c.low, 2)}`;
  if (c.high != null) return `≤ ${formatNumber(c.high, 2)}`;
  return '';
}

export function qcTable(checks, caption = t('lab.qcCaption')) {
  return el('div', { class: 'table-wrap', tabindex: '0', role: 'region', 'aria-label': caption }, el('table', { class: 'stack' },
    el('caption', {}, caption),
    el('thead', {}, el('tr', {}, ['lab.qcCheck', 'lab.qcValue', 'lab.qcWindow', 'lab.qcPassed', 'lab.qcDetail'].map(k => el('th', { scope: 'col' }, t(k))))),
    el('tbody', {}, checks.map(c => el('tr', { class: c.passed ? null : 'failed' },
      el('td', { 'data-label': t('lab.qcCheck') }, `${c.type ?? ''} ${c.analyte ?? ''} ${c.figure ?? ''}`.trim()),
      el('td', { 'data-label': t('lab.qcValue'), class: 'num' }, typeof c.value === 'number' ? formatNumber(c.value, 2) : ''),
      el('td', { 'data-label': t('lab.qcWindow'), class: 'num' }, bounds(c)),
      el('td', { 'data-label': t('lab.qcPassed') }, c.passed ? t('lab.yes') : el('strong', {}, t('lab.no'))),
      el('td', { 'data-label': t('lab.qcDetail') }, c.detail ?? ''))))));
}
