// What every page shares: the header (program name, the pages of this person's work, language, sign-out), the
// sign-in form, and turning API refusals into words. A page calls startPage with what it does once signed in.
import { applyStrings, language, loadStrings, switchLanguage, t } from './i18n.js';
import { ApiError, session } from './session.js';
import { el } from './dom.js';

export { t } from './i18n.js';

const NAV = {
  coordinator: [['/ui/today/', 'nav.today'], ['/ui/households/', 'nav.households'], ['/ui/kits/', 'nav.kits'],
    ['/ui/letters/', 'nav.letters'], ['/ui/lab/batches/', 'nav.batches'], ['/ui/areas/', 'nav.areas']],
  lab: [['/ui/lab/', 'nav.lab']],
  health: [['/ui/health/', 'nav.health']],
  household: [['/ui/result/', 'nav.result']],
};

/**
 * The nav link this page falls under: its own, or its section's (the kit page /ui/kits/kit/ is under Kits), as the
 * longest link the path starts with. The own page is aria-current="page"; a section only "true", since its link
 * leads elsewhere.
 */
function current(links) {
  const path = location.pathname.replace(/index\.html$/, '').replace(/([^/])$/, '$1/');
  const href = links.map(([h]) => h).filter(h => path.startsWith(h)).sort((a, b) => b.length - a.length)[0];
  return { href, value: href === path ? 'page' : 'true' };
}

function header(area, needsKey) {
  const pages = NAV[area] || [];
  const here = current(pages);
  const links = pages.map(([href, key]) => el('li', {}, el('a', {
    href, 'aria-current': href === here.href ? here.value : null,
  }, t(key))));
  const tools = el('div', { class: 'shell-tools' },
    el('button', { type: 'button', lang: t('shell.otherLanguageCode'), onclick: switchLanguage }, t('shell.otherLanguage')),
    needsKey && session.key ? el('button', { type: 'button', id: 'sign-out', onclick: signOut }, t('shell.signOut')) : null);
  return el('div', { class: 'shell-inner' },
    el('a', { class: 'brand', href: '/ui/' }, t('shell.brand'), el('small', {}, t('shell.tagline'))),
    links.length ? el('nav', { 'aria-label': t('shell.navLabel') }, el('ul', {}, links)) : null,
    tools);
}

function signOut() {
  session.signOut();
  location.replace(location.pathname);
}

function signInForm(area, message, onSignedIn) {
  const status = el('p', { class: message ? 'status error' : 'status', role: 'alert' }, message || '');
  const input = el('input', { id: 'key', name: 'key', type: 'password', autocomplete: 'off', required: true, spellcheck: 'false' });
  const form = el('form', { class: 'panel', id: 'sign-in', 'aria-labelledby': 'sign-in-title' },
    el('h1', { id: 'sign-in-title' }, t('signIn.title')),
    el('p', { class: 'lede' }, t(`signIn.who.${area}`)),
    status,
    el('label', { for: 'key' }, t('signIn.key'), el('span', { class: 'hint' }, t('signIn.keyHint'))),
    input,
    el('div', {}, el('button', { type: 'submit' }, t('signIn.submit'))));
  form.addEventListener('submit', event => {
    event.preventDefault();
    session.signIn(input.value);
    form.remove();
    onSignedIn();
  });
  return { form, input };
}

/**
 * Words the service writes in English only (a rule profile's explanation of a level, a QC detail, a collection
 * flag's reason): marked lang="en", so a screen reader reads them as English.
 */
export function fromService(text, tag = 'span', attributes = {}) {
  return el(tag, { ...attributes, lang: 'en' }, text);
}

/** On a page in another language, the line that says such words are in English, where they appear (none in English). */
export function englishOnly(key = 'shell.englishOnly') {
  return language() === 'en' ? null : el('p', { class: 'hint english-only' }, t(key));
}

/** Words for a refused call: the page's own for the statuses a person can act on, else the service's title. */
export function problemText(error) {
  if (!(error instanceof ApiError)) return t('error.network');
  if (error.status === 403) return t('error.forbidden');
  if (error.status === 429) return t('error.tooMany');
  if (error.status >= 500) return t('error.server');
  const fields = Object.values(error.problem.errors || {}).flat();
  if (fields.length) return fields.join(' ');
  return error.problem.detail || error.problem.title || t('error.server');
}

/**
 * Sets the page up. With needsKey, run(main) starts once a key is held; a 401 from any call made inside it
 * forgets the key and asks for it again.
 */
export async function startPage({ area, needsKey = true, run }) {
  await loadStrings();
  const shell = document.getElementById('shell');
  const main = document.getElementById('main');
  const content = document.getElementById('content');
  const render = () => { shell.replaceChildren(header(area, needsKey)); applyStrings(); };
  render();
  if (!needsKey) { await run(main); return; }

  const ask = message => {
    content.hidden = true;
    const { form, input } = signInForm(area, message, start);
    main.prepend(form);
    input.focus();
  };
  async function start() {
    render();
    content.hidden = false;
    try {
      await run(main);
    } catch (error) {
      if (error instanceof ApiError && error.status === 401) {
        session.signOut();
        render();
        ask(t('signIn.refused'));
        return;
      }
      content.prepend(el('p', { class: 'status error', role: 'alert' }, problemText(error)));
      if (!(error instanceof ApiError)) console.error(error);
    }
  }
  if (session.key) await start(); else ask('');
}

/** For calls made after the page started (a button): a 401 asks for the key again, anything else is said in place. */
export function report(error, status) {
  if (error instanceof ApiError && error.status === 401) {
    session.signOut();
    location.reload();
    return;
  }
  status.className = 'status error';
  status.textContent = problemText(error);
  if (!(error instanceof ApiError)) console.error(error);
}
