import type { MeetScoring } from '../api/types.js';
import { describeScoring } from './describe-scoring.js';

/**
 * What a recorded scoring change changed, as the sentences of "How this meet is scored" that
 * differ: each line the meet used to say and each line it says now. `rest` fills the options the
 * change does not store (the entry rules), so only scoring lines can differ.
 */
export function describeMeetChange(beforeJson: string, afterJson: string, rest: MeetScoring): { was: string[]; now: string[] } {
  const read = (json: string): MeetScoring | null => {
    try {
      return { ...rest, ...(JSON.parse(json) as Partial<MeetScoring>) };
    } catch {
      return null;
    }
  };
  const before = read(beforeJson);
  const after = read(afterJson);
  if (!before || !after) return { was: [], now: [] };
  const was = describeScoring(before);
  const now = describeScoring(after);
  return { was: was.filter((line) => !now.includes(line)), now: now.filter((line) => !was.includes(line)) };
}
