// An <input type="datetime-local"> speaks "YYYY-MM-DDTHH:mm" in the device's clock; the API speaks UTC.

const pad = (n: number) => String(n).padStart(2, '0');

/** A stored instant as the text a datetime-local input shows on this device; '' when unreadable. */
export function toLocalInput(isoDateTime: string): string {
  const d = new Date(isoDateTime);
  if (Number.isNaN(d.getTime())) return '';
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** The input's text as an ISO instant, or null when it is not a date and time. */
export function fromLocalInput(text: string): string | null {
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/.test(text)) return null;
  const d = new Date(text);
  return Number.isNaN(d.getTime()) ? null : d.toISOString();
}
