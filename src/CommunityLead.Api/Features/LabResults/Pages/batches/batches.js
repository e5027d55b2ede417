// Held lab batches, for the coordinator: every QC figure with its window, the run's QC report, and a release with
// a reason (the lab explained the failed check, say). Releasing puts the results into effect; the verdict stays
// on record as the service computed it.
import { startPage, report, t, englishOnly, fromService } from '/ui/shell.js';
import { api, download } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { formatDate } from '/ui/i18n.js';
import { qcTable } from '../qc.js';

function releaseForm(batch, index, onReleased) {
  const id = `release-${index}`;
  const status = el('p', { class: 'status', role: 'status', 'aria-live': 'polite' });
  const reason = el('textarea', { id, name: 'reason', required: true, maxlength: '500' });
  const form = el('form', { 'aria-label': t('batches.releaseFor', { id: batch.batchId }) },
    el('label', { for: id }, t('batches.reason'), el('span', { class: 'hint' }, t('batches.reasonHint'))),
    reason,
    el('div', {}, el('button', { type: 'submit' }, t('batches.release'))),
    status);
  form.addEventListener('submit', async event => {
    event.preventDefault();
    try {
      const outcome = await api(`/api/lab/batches/${encodeURIComponent(batch.batchId)}/release`, { method: 'POST', body: { reason: reason.value } });
      onReleased(outcome);
    } catch (error) { report(error, status); }
  });
  return form;
}

function card(detail, index) {
  const b = detail.current;
  const id = `batch-${index}`;
  const failed = b.qc.checks.filter(c => !c.passed).length;
  const status = el('p', { class: 'status', role: 'status', 'aria-live': 'polite' });
  const article = el('article', { class: 'panel kit-card urgent', 'aria-labelledby': `${id}-title` });
  const released = outcome => {
    article.classList.remove('urgent');
    article.replaceChildren(el('h2', { id: `${id}-title` }, el('span', { class: 'code' }, b.batchId)),
      el('p', { class: 'status ok' }, t('batches.released', { id: outcome.batchId, version: outcome.version })));
    say(byId('status'), t('batches.released', { id: outcome.batchId, version: outcome.version }));
  };
  article.append(...[
    el('header', {},
      el('h2', { id: `${id}-title` }, el('span', { class: 'code' }, b.batchId)),
      el('span', {}, t('batches.version', { version: b.version })),
      el('span', { class: 'tag urgent' }, t('batches.failedChecks', { count: failed }))),
    el('p', {}, t('batches.facts', { method: b.method, analyzed: formatDate(b.analyzedAt), results: b.resultCount,
      posted: formatDate(b.postedAt), by: b.postedBy })),
    qcTable(b.qc.checks, t('batches.qcCaption', { id: b.batchId })),
    b.flags.length ? el('ul', { class: 'reasons' }, b.flags.map(f => el('li', {}, el('span', { class: 'code' }, f.kitCode), ' ', fromService(f.message)))) : null,
    b.flags.length ? englishOnly() : null,
    el('button', { type: 'button', class: 'quiet', onclick: () =>
      download(`/api/lab/batches/${encodeURIComponent(b.batchId)}/qc-report`, `qc-${b.batchId}.pdf`).catch(e => report(e, status)) },
      t('batches.qcReport')),
    status,
    releaseForm(b, index, released)].filter(Boolean));
  return article;
}

startPage({
  area: 'coordinator',
  run: async () => {
    const held = await api('/api/lab/batches?status=held&pageSize=50');
    // A batch held twice (a correction that failed again) is one decision: its latest version.
    const ids = [...new Set(held.items.map(i => i.batchId))];
    const details = await Promise.all(ids.map(id => api(`/api/lab/batches/${encodeURIComponent(id)}`)));
    byId('batches').replaceChildren(...details.map(card));
    say(byId('status'), details.length ? t('batches.count', { count: details.length }) : t('batches.none'));
  },
});
