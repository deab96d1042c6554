export type ParsedTime = { ok: true; hundredths: number } | { ok: false; message: string };

// m:ss, m:ss.h, m:ss.hh — the seconds after a colon are always two digits.
const WITH_MINUTES = /^(?<minutes>\d+):(?<seconds>\d{2})(?:\.(?<fraction>\d{1,2}))?$/;
// ss, ss.h, ss.hh — any whole number of seconds, so "75.20" is read as 1:15.20.
const SECONDS_ONLY = /^(?<seconds>\d+)(?:\.(?<fraction>\d{1,2}))?$/;

/**
 * Reads a stopwatch time typed as `m:ss.hh` or `ss.hh` (also `ss`, `ss.h`, `m:ss`, `m:ss.h`)
 * into whole hundredths. Digits are read as integers, never through floating point.
 * Three decimals are refused rather than rounded: a watch reads to the hundredth.
 */
export function parseTime(text: string): ParsedTime {
  const trimmed = text.trim();
  const withMinutes = WITH_MINUTES.exec(trimmed)?.groups;
  if (withMinutes) {
    const seconds = Number(withMinutes['seconds']);
    if (seconds >= 60) return { ok: false, message: `"${text}": seconds must be under 60 after the minutes` };
    return toHundredths(text, Number(withMinutes['minutes']) * 60 + seconds, withMinutes['fraction']);
  }
  const secondsOnly = SECONDS_ONLY.exec(trimmed)?.groups;
  if (secondsOnly) return toHundredths(text, Number(secondsOnly['seconds']), secondsOnly['fraction']);
  if (trimmed.includes(':')) return { ok: false, message: `"${text}" is not m:ss.hh` };
  return { ok: false, message: `"${text}" is not a time (m:ss.hh or ss.hh)` };
}

function toHundredths(text: string, wholeSeconds: number, fraction: string | undefined): ParsedTime {
  // "5" after the point is five tenths, so pad on the right: ".5" → 50 hundredths.
  const hundredths = wholeSeconds * 100 + Number((fraction ?? '').padEnd(2, '0'));
  if (!Number.isSafeInteger(hundredths)) return { ok: false, message: `"${text}" is too long a time` };
  return { ok: true, hundredths };
}
