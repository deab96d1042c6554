import { SafetyNote } from '../../../components/ui/safety-note.js';

/** The usual cautions for a meet day; the sanctioning body's rules come first. */
export function MeetDaySafety() {
  return (
    <SafetyNote title="Safety on meet day">
      Protective footwear and leg protection for every chopping and sawing event, and eye protection for everyone
      near a block. Keep the clear zone around each block, stand and throwing lane empty while an athlete works.
      Sheath every edge the moment it is not in use, and keep loose heads and cracked handles out of use. The
      sanctioning body&apos;s rules, local law and the officials&apos; calls come first; Endgrain is no substitute for
      qualified coaching.
    </SafetyNote>
  );
}
