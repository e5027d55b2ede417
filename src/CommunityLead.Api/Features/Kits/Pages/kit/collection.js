// The household's collection form, typed in by the coordinator for a water kit (first draw and flushed bottle):
// when each bottle was filled, when the water was last used before the first draw, which tap, how long it ran.
// Sequential and soil kits have more bottles than this form: they are recorded through the API.
import { t, report } from '/ui/shell.js';
import { api, ApiError } from '/ui/session.js';
import { byId, say } from '/ui/dom.js';
import { withOffset } from '/ui/times.js';

function number(id) {
  const text = byId(id).value.trim();
  return text === '' ? null : Number(text);
}

function time(id) {
  return byId(id).value ? withOffset(byId(id).value) : null;
}

export function showCollection(kit, onRecorded) {
  const form = byId('collection-form');
  form.hidden = !(kit.state === 'issued' && kit.kind === 'water');
  if (form.hidden || form.dataset.ready) return;
  form.dataset.ready = 'true';
  form.addEventListener('submit', async event => {
    event.preventDefault();
    const samples = [
      { bottle: 'first-draw', volumeMl: number('c-first-volume'), collectedAt: time('c-first-at'), waterLastUsedAt: time('c-last-used'), tap: byId('c-tap').value },
      { bottle: 'flushed', volumeMl: number('c-flushed-volume'), collectedAt: time('c-flushed-at'), flushSeconds: number('c-flush-seconds') },
    ];
    try {
      await api(`/api/kits/${encodeURIComponent(kit.code)}/collection`, { method: 'POST', body: { samples } });
      await onRecorded(t('kit.collectionRecorded'));
    } catch (error) {
      const fields = error instanceof ApiError && error.status === 400 ? Object.entries(error.problem.errors || {}) : [];
      if (!fields.length) { report(error, byId('collection-status')); return; }
      // "samples[1].collectedAt" names a bottle by its place in the list: said with the bottle's name instead.
      say(byId('collection-status'), fields.map(([key, messages]) => {
        const bottle = /samples\[(\d+)\]/i.exec(key);
        return `${bottle ? `${t(`bottle.${samples[Number(bottle[1])]?.bottle}`)}: ` : ''}${messages.join(' ')}`;
      }).join(' '), 'error');
    }
  });
}
