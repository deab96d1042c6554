import { COACHING_CAUTION, type SeedNote } from './seed-note.js';

const CURATOR = 'admin@example.org';

/** First Cuts, steps 5–7. */
export const FIRST_CUTS_PART_TWO: SeedNote[] = [
  {
    slug: 'handle-and-head-checks',
    kind: 'GUIDE',
    authorEmail: CURATOR,
    title: 'Handle and head checks',
    summary: 'A two-minute check before every session: the head, the wedge, the handle and the hang.',
    publishedOn: '2026-09-26',
    tags: { free: ['first cuts', 'inspection'] },
    body: `Do this check every time you take an axe off the rack, and hand back any axe that fails it.

# The head

- Hold the handle and try to twist and rock the head. **Any movement means the axe is out of use** until it is tightened or rehung.
- Look at the eye from the top: the wedge should sit flush, with no gap round the handle.
- Check the poll and cheeks for cracks.

# The handle

- Run your hand along it (gloved if it has been used hard). Splinters, cracks, or a soft spot near the head all take the axe out of use.
- Look for grain running out of the side of the handle: that is where it breaks.
- A handle that was pinned or glued should show it in the Rack's service log.

# The hang

Lay the axe on a flat table on its bit and the end of the handle. Your coach will show you what your club expects to see; a change from last time means something moved.

# Mark it in the Rack

| What you found | Set the axe to |
| --- | --- |
| head moves | head loose |
| crack or split in the handle | needs handle |
| dull or chipped edge | needs edge |
| all good | ready |

Axes marked head loose or needs handle cannot be handed out in a lineup until someone fixes them and logs the work.

${COACHING_CAUTION}`,
  },
  {
    slug: 'choosing-an-axe-for-the-wood',
    kind: 'GUIDE',
    authorEmail: CURATOR,
    title: 'Choosing an axe for the wood',
    summary: 'How grind, bevel and chisel width trade off in soft, hard, wet and frozen blocks, and where to look for evidence.',
    publishedOn: '2026-10-03',
    tags: { species: ['quaking-aspen', 'eastern-white-pine', 'yellow-poplar'], grinds: ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'], conditions: ['GREEN', 'DRY', 'FROZEN'], free: ['first cuts'] },
    body: `There is no single best axe. The head that flies through soft, wet aspen can bind in dry pine and chip in frozen wood.

# The three words you will hear

- **Grind**: the shape of the cheeks behind the edge — flat, convex, a chisel (a secondary bevel right at the edge), or compound (a flat or convex body with a chisel).
- **Bevel angle**: how steep the edge is, written as the included angle (both sides together) in Endgrain.
- **Chisel width**: how far back from the edge the secondary bevel runs; common ones are from about ¼ in (6 mm) to over 1 in (25 mm).

# Rules of thumb coaches start from

| Wood | Often tried first | Watch for |
| --- | --- | --- |
| soft, wet (aspen, cottonwood, basswood) | thinner edges, chisel or compound grinds | the bit sticking on the way out |
| softwood, clean (white pine) | flat or compound, moderate bevel | knots |
| harder or dry blocks | steeper bevels, narrower chisels | chipping |
| frozen | not your racing edge at all | chips and glancing blows |

These are starting points, not answers. Check the **Grain Map** for what your league's own results and trials say, and read the findings linked to each cell, with their evidence beside them.

# Ask before you swap

Every axe in the Rack says who may use it: anyone, developing and experienced athletes, or experienced only. Never take an axe you are not cleared for, and never borrow one at a meet without its owner's and your coach's say-so.

${COACHING_CAUTION}`,
  },
  {
    slug: 'what-to-expect-at-a-first-meet',
    kind: 'GUIDE',
    authorEmail: CURATOR,
    title: 'What to expect at your first meet',
    summary: 'Check-in, heats, timing, scratches and the etiquette of the chopping area, so nothing on the day is a surprise.',
    publishedOn: '2026-10-08',
    tags: { events: ['underhand-chop', 'standing-block-chop', 'single-buck', 'axe-throw'], free: ['first cuts', 'meet day'] },
    body: `A meet is long, loud and mostly waiting. Knowing the shape of the day lets you save your energy for your heats.

# Before the day

- Your coach enters you in events in Endgrain; you can see your events and heats on the meet page once the draw is made.
- Pack your protective gear yourself and check it the night before. Hosts can refuse you the block without it.
- Read the host's rules for each event: block sizes, time limits and penalties differ between hosts.

# On the day

1. **Check in** with your club and find the chopping areas, the first-aid point and the axe-safe area.
2. **Warm up** away from the blocks, never with a bare edge near other people.
3. **Heats** run in the order of the draw. Be ready at the line when your heat is called; a no-show is a scratch.
4. **Timing**: one to three timekeepers start their watches on the signal. With two watches the times are averaged; with three, the one furthest from the others is dropped.
5. Results go up once the organiser posts them, with places and points worked out by Endgrain.

# Etiquette

- Only the athlete, the judges and the timekeepers are inside the rope during a heat.
- Sheathe your axe the moment you step back from the block.
- A judge's call is final on the day; your coach handles any question afterwards.

# If something goes wrong

Stop, lower the axe, and raise your hand. A scratch, a "did not finish" or a disqualification is recorded as just that — it never costs you more than the event.

${COACHING_CAUTION}`,
  },
];
