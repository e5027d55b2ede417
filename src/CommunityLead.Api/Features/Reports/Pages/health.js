// Health summary: the report as tables and as SVG charts drawn by the service, and its CSV. A hidden (suppressed)
// count is written "hidden", never 0, in the tables; the charts draw it hatched.
import { startPage, report, t } from '/ui/shell.js';
import { api, download } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { language, formatNumber } from '/ui/i18n.js';

const BANDS = ['notDetected', 'low', 'advisory', 'action', 'urgent'];

function query() {
  const q = new URLSearchParams({ groupBy: byId('group-by').value });
  if (byId('from').value) q.set('from', byId('from').value);
  if (byId('to').value) q.set('to', byId('to').value);
  return q;
}

function cell(c) {
  return c.suppressed ? el('td', { class: 'num suppressed' }, t('health.hidden')) : el('td', { class: 'num' }, formatNumber(c.value));
}

function share(row) {
  const s = row.shareAtOrAboveActionLevel;
  if (!s) return el('td', { class: 'num suppressed' }, t('health.hidden'));
  const pct = v => formatNumber(v * 100, 0);
  return el('td', { class: 'num' }, `${pct(s.proportion)} % (${pct(s.low95)}–${pct(s.high95)} %)`);
}

function table(summary) {
  const rows = [...summary.rows, { ...summary.total, group: t('health.total') }];
  return el('table', {},
    el('caption', {}, t('health.tableCaption', { threshold: summary.suppressionThreshold })),
    el('thead', {}, el('tr', {},
      el('th', { scope: 'col' }, t('health.group')), el('th', { scope: 'col', class: 'num' }, t('health.issued')),
      el('th', { scope: 'col', class: 'num' }, t('health.analyzed')),
      BANDS.map(b => el('th', { scope: 'col', class: 'num' }, t(`health.band.${b}`))),
      el('th', { scope: 'col', class: 'num' }, t('health.share')), el('th', { scope: 'col', class: 'num' }, t('health.daysToLetter')))),
    el('tbody', {}, rows.map(r => el('tr', {},
      el('th', { scope: 'row' }, r.group), cell(r.kitsIssued), cell(r.kitsAnalyzed),
      BANDS.map(b => cell(r.lead[b])), share(r),
      r.daysToLetterMedian == null ? el('td', { class: 'num suppressed' }, t('health.hidden')) : el('td', { class: 'num' }, formatNumber(r.daysToLetterMedian, 1))))));
}

/** The service's SVG, parsed as SVG (never as HTML) and placed in the page. */
async function chart(name, target) {
  const q = query();
  q.set('chart', name);
  q.set('lang', language());
  const text = await api(`/api/reports/summary/chart?${q}`);
  const svg = new DOMParser().parseFromString(text, 'image/svg+xml').documentElement;
  svg.removeAttribute('width');
  svg.removeAttribute('height');
  byId(target).replaceChildren(document.importNode(svg, true));
}

async function show(event) {
  event?.preventDefault();
  const status = byId('status');
  try {
    const summary = await api(`/api/reports/summary?${query()}`);
    byId('tables').replaceChildren(table(summary));
    byId('notes').replaceChildren(...summary.notes.map(n => el('li', {}, n)));
    await chart('lead-bands', 'bands-chart');
    await chart('share-at-action-level', 'share-chart');
    say(status, t('health.shown', { count: summary.rows.length }));
  } catch (error) {
    report(error, status);
  }
}

startPage({
  area: 'health',
  run: async () => {
    byId('filters').addEventListener('submit', show);
    byId('csv').addEventListener('click', () => {
      const q = query();
      q.set('format', 'csv');
      download(`/api/reports/summary?${q}`, 'health-summary.csv').catch(e => report(e, byId('status')));
    });
    await show();
  },
});
