// A batch's QC figures, each beside its window and verdict: the lab's upload page and the coordinator's held
// batches show the same table.
import { t } from '/ui/shell.js';
import { el } from '/ui/dom.js';
import { formatNumber } from '/ui/i18n.js';

function window(c) {
  if (c.low == null && c.high == null) return '';
  return `${c.low != null ? formatNumber(c.low, 2) : '—'} – ${c.high != null ? formatNumber(c.high, 2) : '—'}`;
}

export function qcTable(checks, caption = t('lab.qcCaption')) {
  return el('div', { class: 'table-wrap', tabindex: '0', role: 'region', 'aria-label': caption }, el('table', {},
    el('caption', {}, caption),
    el('thead', {}, el('tr', {}, ['lab.qcCheck', 'lab.qcValue', 'lab.qcWindow', 'lab.qcPassed', 'lab.qcDetail'].map(k => el('th', { scope: 'col' }, t(k))))),
    el('tbody', {}, checks.map(c => el('tr', { class: c.passed ? null : 'failed' },
      el('td', {}, `${c.type ?? ''} ${c.analyte ?? ''} ${c.figure ?? ''}`.trim()),
      el('td', { class: 'num' }, typeof c.value === 'number' ? formatNumber(c.value, 2) : ''),
      el('td', { class: 'num' }, window(c)),
      el('td', {}, c.passed ? t('lab.yes') : el('strong', {}, t('lab.no'))),
      el('td', {}, c.detail ?? ''))))));
}
