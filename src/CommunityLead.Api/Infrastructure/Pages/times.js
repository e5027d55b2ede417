// The API refuses a time without its UTC offset, so times typed in a datetime-local field are sent with the
// offset of this computer's clock (the household's or the office's, whoever is typing).
function pad(n) { return String(Math.abs(n)).padStart(2, '0'); }

export function withOffset(local) {
  const date = new Date(local);
  const minutes = -date.getTimezoneOffset();
  const sign = minutes >= 0 ? '+' : '-';
  const seconds = local.length === 16 ? ':00' : '';
  return `${local}${seconds}${sign}${pad(Math.trunc(minutes / 60))}:${pad(minutes % 60)}`;
}

export function nowWithOffset() {
  const d = new Date();
  const local = `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}:${pad(d.getSeconds())}`;
  return withOffset(local);
}

/** An ISO time with offset, as this computer's local time for a datetime-local field. */
export function localInput(iso) {
  const d = new Date(iso);
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}
