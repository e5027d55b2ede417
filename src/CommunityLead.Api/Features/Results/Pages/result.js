// A household's result, by the kit code and the secret code printed on its letter (never the code alone). The
// words are the letter's own, in the letter's language; the letter itself downloads as a PDF.
import { startPage, report, t } from '/ui/shell.js';
import { api, ApiError, download } from '/ui/session.js';
import { el, byId, say } from '/ui/dom.js';
import { letterWords } from './words.js';

function body() {
  return { code: byId('code').value.trim(), secret: byId('secret').value.trim() };
}

function show(result) {
  const article = byId('result');
  article.lang = result.language;
  article.replaceChildren(
    ...letterWords(result, { titleId: 'result-title' }),
    el('button', { type: 'button', id: 'letter', onclick: async () => {
      try {
        await download('/api/results/letter', `letter-${result.kitCode}.pdf`, { method: 'POST', body: body() });
      } catch (error) { report(error, byId('status')); }
    } }, t('result.letter')));
  article.hidden = false;
  byId('result-title').focus();
}

async function lookup(event) {
  event.preventDefault();
  const status = byId('status');
  byId('result').hidden = true;
  try {
    show(await api('/api/results', { method: 'POST', body: body(), key: null }));
    say(status, '');
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) say(status, t('result.noMatch'), 'error');
    else report(error, status);
  }
}

startPage({
  area: 'household',
  needsKey: false,
  run: async () => byId('lookup').addEventListener('submit', lookup),
});
