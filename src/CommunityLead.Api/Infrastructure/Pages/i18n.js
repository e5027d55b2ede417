// Words of the pages, from one JSON file per language (strings.en.json, strings.es.json). The language is a
// preference, not a secret, so it lives in local storage; ?lang=es in the address picks it too.
const STORE = 'communitylead.language';
const LANGUAGES = ['en', 'es'];
let strings = {};
let current = 'en';
// The program's time zone (Program:TimeZone): every date and time on a page is read on the program's calendar, so
// staff in another zone, or a laptop set wrongly, see the same dates the letters print.
let zone;

export function language() { return current; }

export async function loadStrings() {
  const asked = new URLSearchParams(location.search).get('lang');
  const saved = localStorage.getItem(STORE);
  const browser = (navigator.language || 'en').slice(0, 2);
  current = [asked, saved, browser].find(l => LANGUAGES.includes(l)) || 'en';
  if (asked && LANGUAGES.includes(asked)) localStorage.setItem(STORE, asked);
  const [response, calendar] = await Promise.all([fetch(`/ui/strings.${current}.json`), fetch('/api/calendar').catch(() => null)]);
  strings = await response.json();
  zone = calendar?.ok ? (await calendar.json()).timeZone : undefined;
  document.documentElement.lang = current;
}

export function switchLanguage() {
  localStorage.setItem(STORE, current === 'en' ? 'es' : 'en');
  const url = new URL(location.href);
  url.searchParams.delete('lang');
  location.replace(url);
}

/** The string for a key, with {name} placeholders filled; the key itself when a string is missing, so a gap shows. */
export function t(key, values = {}) {
  const text = strings[key] ?? key;
  return text.replace(/\{(\w+)\}/g, (_, name) => (name in values ? String(values[name]) : `{${name}}`));
}

/** Fills data-i18n (text), data-i18n-placeholder and data-i18n-label (aria-label) under root. */
export function applyStrings(root = document) {
  root.querySelectorAll('[data-i18n]').forEach(e => { e.textContent = t(e.dataset.i18n); });
  root.querySelectorAll('[data-i18n-placeholder]').forEach(e => { e.placeholder = t(e.dataset.i18nPlaceholder); });
  root.querySelectorAll('[data-i18n-label]').forEach(e => e.setAttribute('aria-label', t(e.dataset.i18nLabel)));
  if (document.body.dataset.title) document.title = `${t(document.body.dataset.title)} · ${t('shell.brand')}`;
}

/** Numbers and dates in the page's language. */
export function formatNumber(value, digits = 0) {
  return new Intl.NumberFormat(current, { maximumFractionDigits: digits, minimumFractionDigits: digits }).format(value);
}

export function formatDate(iso) {
  const style = { dateStyle: 'medium', timeStyle: 'short' };
  try {
    return new Intl.DateTimeFormat(current, { ...style, timeZone: zone }).format(new Date(iso));
  } catch {
    return new Intl.DateTimeFormat(current, style).format(new Date(iso)); // a zone this browser does not know
  }
}
