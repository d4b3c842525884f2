/** Dates for the report header, unambiguous in any country: "2026-03-14 09:21 UTC" or with the local offset. */

function pad(n: number): string {
  return String(n).padStart(2, '0');
}

/**
 * An ISO 8601 time as "YYYY-MM-DD hh:mm" in UTC ("… UTC") or in the device's time zone ("… (UTC+01:00)").
 * Text that is not a date is returned as it is, so a damaged record still prints.
 */
export function formatDateTime(iso: string, utc = false): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  if (utc) {
    return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())} ${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())} UTC`;
  }
  const off = -d.getTimezoneOffset();
  const sign = off >= 0 ? '+' : '−';
  const abs = Math.abs(off);
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())} ${pad(d.getHours())}:${pad(d.getMinutes())} (UTC${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)})`;
}
