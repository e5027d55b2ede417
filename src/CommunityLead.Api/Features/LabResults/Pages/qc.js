// A batch's QC figures, each beside its window and verdict: the lab's upload page and the coordinator's held
// batches show the same table.
import { englishOnly, fromService, t } from '/ui/shell.js';
import { el } from '/ui/dom.js';
import { formatNumber } from '/ui/i18n.js';

/** A window with both ends as "low – high"; with one end as a bound ("≥ 1", "≤ 0.5"); none for a figure only reported. */
function bounds(c) {
  if (c.low != null && c.high != null) return `${formatNumber(c.low, 2)} – ${formatNumber(c.high, 2)}`;
  if (c.low != null) return `≥ ${formatNumber(c.low, 2)}`;
  if (c.high != null) return `≤ ${formatNumber(c.high, 2)}`;
  return '';
}

/** The page's word for a value of the service (a QC type, a figure's name), or the service's own, marked English. */
function named(prefix, value) {
  if (value == null) return null;
  const key = `${prefix}.${value}`;
  const text = t(key);
  return text === key ? fromService(value) : text;
}

/** "Calibration check · Lead · recovery %": the sample's type (none for a batch-wide figure), the analyte, the figure. */
function checkName(c) {
  return [named('qcType', c.type), named('analyte', c.analyte), named('qcFigure', c.figure)]
    .filter(Boolean).flatMap((part, i) => (i ? [' · ', part] : [part]));
}

export function qcTable(checks, caption = t('lab.qcCaption')) {
  return el('div', {},
    el('div', { class: 'table-wrap', tabindex: '0', role: 'region', 'aria-label': caption }, el('table', { class: 'stack' },
      el('caption', {}, caption),
      el('thead', {}, el('tr', {}, ['lab.qcCheck', 'lab.qcValue', 'lab.qcWindow', 'lab.qcPassed', 'lab.qcDetail'].map(k => el('th', { scope: 'col' }, t(k))))),
      el('tbody', {}, checks.map(c => el('tr', { class: c.passed ? null : 'failed' },
        el('td', { 'data-label': t('lab.qcCheck') }, checkName(c)),
        el('td', { 'data-label': t('lab.qcValue'), class: 'num' }, typeof c.value === 'number' ? formatNumber(c.value, 2) : ''),
        el('td', { 'data-label': t('lab.qcWindow'), class: 'num' }, bounds(c)),
        el('td', { 'data-label': t('lab.qcPassed') }, c.passed ? t('lab.yes') : el('strong', {}, t('lab.no'))),
        // The service words each detail in English only (its figures are in the other columns, in the page's language).
        el('td', { 'data-label': t('lab.qcDetail') }, c.detail ? fromService(c.detail) : '')))))),
    checks.some(c => c.detail) ? englishOnly('lab.qcDetailInEnglish') : null);
}
