import { SafetyNote } from '../../../components/ui/safety-note.js';

const DEFER =
  "The sanctioning body's rules and local law come first; Endgrain is no substitute for qualified coaching.";

/** The usual cautions, worded for each rack screen: handing out axes, servicing them, lining up a meet. */
export function RackCautions({ screen }: { screen: 'rack' | 'service' | 'lineup' }) {
  if (screen === 'service') {
    return (
      <SafetyNote title="Safety at the grinder and the bench">
        Wear eye protection and gloves when grinding or honing, and keep water on the wheel so the edge does not lose
        its temper. Clamp the head, work away from the body, and sheath the edge as soon as you put it down. Check the
        hang and the wedge after every rehang; a loose head or a cracked handle stays out of use until it is fixed.
        Never test a competition edge in frozen wood. {DEFER}
      </SafetyNote>
    );
  }
  if (screen === 'lineup') {
    return (
      <SafetyNote title="Safety before handing out axes">
        Every chopper wears protective footwear and leg protection; everyone near a block wears eye protection. Keep
        the clear zone empty while an athlete swings, carry and store every axe sheathed, and keep loose heads and
        cracked handles out of use. Give an athlete only an axe they have been coached on. {DEFER}
      </SafetyNote>
    );
  }
  return (
    <SafetyNote title="Safety with the rack">
      Keep every edge sheathed on the rack and in transport. Check the head and handle before each session: a loose
      head or a cracked handle goes out of use at once. Protective footwear, leg protection and eye protection for
      anyone swinging, and a clear zone around them; never test a competition edge in frozen wood. {DEFER}
    </SafetyNote>
  );
}
