// The key a person signed in with, and every call to the API. The key stays in this tab's session storage only:
// never in a URL, a cookie or local storage, and signing out (or closing the tab) forgets it.
const KEY = 'communitylead.key';

export const session = {
  get key() { return sessionStorage.getItem(KEY); },
  signIn(key) { sessionStorage.setItem(KEY, key.trim()); },
  signOut() { sessionStorage.removeItem(KEY); },
};

/** An answer other than 2xx, with its problem details (RFC 9457) when the service sent them. */
export class ApiError extends Error {
  constructor(status, problem, response) {
    super(problem?.detail || problem?.title || `HTTP ${status}`);
    this.status = status;
    this.problem = problem || {};
    this.response = response;
  }
}

/**
 * Calls the API with the bearer key. A plain object body goes as JSON; a string or Blob goes as it is with the
 * given content type. Returns the parsed JSON (null for 204), or the Response itself when raw is set.
 */
export async function api(path, { method = 'GET', body, contentType, headers = {}, raw = false, key = session.key } = {}) {
  const sent = { ...headers };
  if (key) sent.Authorization = `Bearer ${key}`;
  let payload = body;
  if (body !== undefined && !(body instanceof Blob) && typeof body !== 'string') {
    payload = JSON.stringify(body);
    sent['Content-Type'] = 'application/json';
  } else if (contentType) {
    sent['Content-Type'] = contentType;
  }
  const response = await fetch(path, { method, headers: sent, body: payload, cache: 'no-store' });
  if (!response.ok) {
    let problem = null;
    try { problem = await response.json(); } catch { /* not JSON: the status says enough */ }
    throw new ApiError(response.status, problem, response);
  }
  if (raw) return response;
  if (response.status === 204) return null;
  const type = response.headers.get('Content-Type') || '';
  return type.includes('json') ? response.json() : response.text();
}

/** Fetches a file with the key and hands it to the browser as a download (a link cannot carry the header). */
export async function download(path, fallbackName, options = {}) {
  const response = await api(path, { ...options, raw: true });
  const disposition = response.headers.get('Content-Disposition') || '';
  const named = /filename\*?=(?:UTF-8'')?"?([^";]+)"?/i.exec(disposition);
  const blob = await response.blob();
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = named ? decodeURIComponent(named[1]) : fallbackName;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10000);
  return response;
}
