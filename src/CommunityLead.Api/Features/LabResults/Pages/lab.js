// Lab upload: post a CSV or JSON batch as the lab's key. A refused batch (422) is shown problem by problem beside
// the text of its row, so the lab can fix the file and post it again; an accepted one shows its verdict and QC.
import { startPage, report, t, englishOnly, fromService } from '/ui/shell.js';
import { api, ApiError } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { withOffset } from '/ui/times.js';
import { qcTable } from './qc.js';

function isCsv(file) { return /\.csv$/i.test(file.name) || file.type === 'text/csv'; }

/** "row 5" (CSV line, header = 1) or "/results/3/unit" (JSON pointer) → the text of that line or item. */
function rowText(row, text, csv) {
  if (!row) return '';
  const line = /^row (\d+)/.exec(row);
  if (csv && line) return text.split(/\r?\n/)[Number(line[1]) - 1] ?? '';
  const pointer = /^\/(results|qc)\/(\d+)/.exec(row);
  if (!csv && pointer) {
    try { return JSON.stringify(JSON.parse(text)[pointer[1]][Number(pointer[2])]); } catch { return ''; }
  }
  return '';
}

/** "row 5" in the page's language; a JSON pointer as it is. */
function rowName(row) {
  const line = /^row (\d+)$/.exec(row || '');
  return line ? t('lab.rowNumber', { n: line[1] }) : row || t('lab.wholeBatch');
}

/**
 * Each problem with its reason. The service says each reason once, in errors under the problem's key (a row and
 * column may have several): the nth problem of a key has the nth reason.
 */
function problemsOf(refusal) {
  const seen = new Map();
  return (refusal.problems || []).map(p => {
    const n = seen.get(p.key) ?? 0;
    seen.set(p.key, n + 1);
    return { ...p, reason: refusal.errors?.[p.key]?.[n] ?? '' };
  });
}

function showProblems(problems, text, csv) {
  byId('outcome').hidden = true;
  byId('problem-table').replaceChildren(el('table', {},
    el('caption', {}, t('lab.problemsCaption', { count: problems.length })),
    el('thead', {}, el('tr', {}, ['lab.row', 'lab.rowText', 'lab.field', 'lab.reason'].map(k => el('th', { scope: 'col' }, t(k))))),
    el('tbody', {}, problems.map(p => el('tr', { class: 'problem-row' },
      el('td', {}, rowName(p.row)),
      el('td', {}, el('pre', { class: 'row-text' }, rowText(p.row, text, csv))),
      el('td', {}, p.field || ''),
      el('td', {}, fromService(p.reason)))))), problems.length ? englishOnly() : null);
  byId('problems').hidden = false;
  byId('problems-title').focus();
}

function showOutcome(batch) {
  byId('problems').hidden = true;
  const checks = batch.qc?.checks || batch.qcChecks || [];
  byId('outcome-body').replaceChildren(
    el('p', {}, t('lab.outcome', { id: batch.batchId, version: batch.version, status: t(`batchStatus.${batch.status}`) })),
    checks.length ? qcTable(checks) : null);
  byId('outcome').hidden = false;
  byId('outcome-title').focus();
}

async function post(event) {
  event.preventDefault();
  const status = byId('status');
  const file = byId('file').files[0];
  if (!file) { say(status, t('lab.chooseFile'), 'error'); return; }
  const text = await file.text();
  const csv = isCsv(file);
  let path = '/api/lab/batches';
  if (csv) {
    const query = new URLSearchParams();
    for (const [name, id] of [['batchId', 'batch-id'], ['method', 'method']]) if (byId(id).value.trim()) query.set(name, byId(id).value.trim());
    if (byId('analyzed-at').value) query.set('analyzedAt', withOffset(byId('analyzed-at').value));
    if (byId('correction').checked) {
      query.set('correction', 'true');
      query.set('correctionReason', byId('correction-reason').value.trim());
    }
    path += `?${query}`;
  }
  try {
    const batch = await api(path, { method: 'POST', body: text, contentType: csv ? 'text/csv; charset=utf-8' : 'application/json' });
    say(status, t('lab.accepted', { id: batch.batchId }));
    showOutcome(batch);
  } catch (error) {
    if (error instanceof ApiError && error.status === 422) {
      say(status, t('lab.refused'), 'error');
      showProblems(problemsOf(error.problem), text, csv);
      return;
    }
    report(error, status);
  }
}

startPage({
  area: 'lab',
  run: async () => {
    byId('upload-form').addEventListener('submit', post);
    byId('file').addEventListener('change', () => {
      const file = byId('file').files[0];
      byId('csv-fields').disabled = Boolean(file) && !isCsv(file);
    });
  },
});
