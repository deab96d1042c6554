/**
 * Prints stored hundredths as `ss.hh` under a minute ("45.23", "9.05") and `m:ss.hh` from
 * one minute ("1:05.20"). Minutes are shown only when there are any: chopping times are mostly
 * under a minute and "0:45.23" reads slower on a results board. Both forms parse back.
 */
export function formatTime(hundredths: number): string {
  if (!Number.isSafeInteger(hundredths) || hundredths < 0) {
    throw new RangeError(`a time is a whole, non-negative number of hundredths, got ${hundredths}`);
  }
  const fraction = String(hundredths % 100).padStart(2, '0');
  const totalSeconds = Math.floor(hundredths / 100);
  if (totalSeconds < 60) return `${totalSeconds}.${fraction}`;
  const seconds = String(totalSeconds % 60).padStart(2, '0');
  return `${Math.floor(totalSeconds / 60)}:${seconds}.${fraction}`;
}
