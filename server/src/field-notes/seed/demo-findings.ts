import { COACHING_CAUTION, type SeedNote } from './seed-note.js';

const DEMO = '**Demo finding.** Every number here is invented for the Endgrain demo league; it shows how a finding reads, not what real wood does.';

/** Findings by the demo coaches, each linked to the Grain Map cells that back it. */
export const DEMO_FINDINGS: SeedNote[] = [
  {
    slug: 'chisel-grinds-in-green-aspen',
    kind: 'FINDING',
    authorEmail: 'coach@example.org',
    title: 'Chisel grinds held their speed in green quaking aspen',
    summary: 'Demo: on wet aspen, our chisel-ground axes cut about 6 % deeper per swing than flat grinds and still came out cleanly.',
    publishedOn: '2026-10-20',
    tags: { species: ['quaking-aspen'], grinds: ['CHISEL', 'FLAT'], events: ['underhand-chop'], conditions: ['GREEN'], free: ['demo'] },
    evidence: [
      { kind: 'GRAIN_CELL', species: 'quaking-aspen', grind: 'CHISEL', condition: 'GREEN', label: 'Green quaking aspen × chisel', summary: 'demo: 14 results, 6 athletes, median ratio 0.94 to their usual times' },
      { kind: 'GRAIN_CELL', species: 'quaking-aspen', grind: 'FLAT', condition: 'GREEN', label: 'Green quaking aspen × flat', summary: 'demo: 11 results, 5 athletes, median ratio 1.00' },
    ],
    body: `${DEMO}

# What we saw

Over the autumn practices Larchmere's underhand choppers swung chisel-ground and flat-ground axes on green quaking aspen of about 300 mm (12 in).

| grind | trials | depth per swing (demo) | bit release |
| --- | ---: | ---: | --- |
| chisel, ½ in | 9 | 41 mm | easy |
| flat | 7 | 38 mm | even |

The chisel axes went deeper per counted swing and did not grab on the way out, which is what usually slows a thin edge in wet wood.

# How sure are we

Suggestive, not strong: two testers did most of the swings. See the Grain Map cells beside this note for the counts.

${COACHING_CAUTION}`,
  },
  {
    slug: 'convex-bits-in-wet-cottonwood',
    kind: 'FINDING',
    authorEmail: 'coach.cedarfork@example.org',
    title: 'Convex bits released more freely in wet cottonwood',
    summary: 'Demo: in sappy eastern cottonwood our convex-ground axes rarely stuck, while thin chisels grabbed.',
    publishedOn: '2026-11-04',
    tags: { species: ['eastern-cottonwood'], grinds: ['CONVEX', 'CHISEL'], events: ['standing-block-chop'], conditions: ['GREEN'], free: ['demo'] },
    evidence: [
      { kind: 'GRAIN_CELL', species: 'eastern-cottonwood', grind: 'CONVEX', condition: 'GREEN', label: 'Green eastern cottonwood × convex', summary: 'demo: 8 results, 4 athletes' },
    ],
    body: `${DEMO}

# What we saw

Cedar Fork's standing block choppers tried two heads on green eastern cottonwood. The convex head sprang free on almost every swing; the thin chisel went in deep and then stuck, costing a second pull.

- Convex: bit release "easy" or "pops free" on 22 of 24 swings (demo).
- Chisel: "sticky" or "grabs" on 10 of 24 swings (demo).

# What we do now

We start newcomers on the convex head in wet cottonwood and move to the chisel once their recovery is quick.

${COACHING_CAUTION}`,
  },
  {
    slug: 'flat-grinds-on-knotty-pine',
    kind: 'FINDING',
    authorEmail: 'coach@example.org',
    title: 'Flat grinds were steadier than chisels on knotty white pine',
    summary: 'Demo: where knots were in the cut, flat-ground axes lost less time than chisels, which chipped twice.',
    publishedOn: '2026-11-18',
    tags: { species: ['eastern-white-pine'], grinds: ['FLAT', 'CHISEL'], events: ['underhand-chop'], conditions: ['KNOTTY'], free: ['demo'] },
    evidence: [
      { kind: 'GRAIN_CELL', species: 'eastern-white-pine', grind: 'FLAT', condition: 'KNOTTY', label: 'Knotty eastern white pine × flat', summary: 'demo: 6 results, 3 athletes; not enough data yet' },
    ],
    body: `${DEMO}

# What we saw

On knotty eastern white pine the flat-ground axes kept cutting through the knots; two chisel edges chipped and went for regrinding.

# How sure are we

Not enough data yet: six results from three athletes. We are writing it up so others can add their own.

Chipped edges are a safety matter as well as a speed one: take a chipped axe out of use and log it in the Rack.

${COACHING_CAUTION}`,
  },
  {
    slug: 'frozen-basswood-and-thin-chisels',
    kind: 'FINDING',
    authorEmail: 'coach.cedarfork@example.org',
    title: 'Thin chisels chipped in frozen basswood',
    summary: 'Demo: a cold-morning practice on frozen American basswood chipped two racing chisels; keep racing edges out of frozen wood.',
    publishedOn: '2026-12-14',
    tags: { species: ['american-basswood'], grinds: ['CHISEL'], conditions: ['FROZEN'], free: ['demo', 'winter'] },
    evidence: [
      { kind: 'GRAIN_CELL', species: 'american-basswood', grind: 'CHISEL', condition: 'FROZEN', label: 'Frozen American basswood × chisel', summary: 'demo: 4 trial runs, 2 edges chipped' },
    ],
    body: `${DEMO}

# What happened

Blocks left out overnight froze through. Two chisel-ground racing axes chipped within the first few swings, and one glanced off the face.

# What we changed

- Frozen blocks are for practice axes with steeper edges only, or for no chopping at all.
- Blocks for morning practice are brought inside the night before.
- A glancing blow is the reason the clear zone and leg protection matter: nobody stands near the block while it is cut.

${COACHING_CAUTION}`,
  },
  {
    slug: 'compound-grinds-in-seasoned-yellow-poplar',
    kind: 'FINDING',
    authorEmail: 'coach@example.org',
    title: 'Compound grinds at about 16° suited seasoned yellow-poplar',
    summary: 'Demo: in seasoned yellow-poplar a compound grind at about 16° included cut as deep as a 14° edge without the chipping.',
    publishedOn: '2027-01-22',
    tags: { species: ['yellow-poplar'], grinds: ['COMPOUND'], events: ['underhand-chop'], conditions: ['SEASONED'], free: ['demo', 'bevel'] },
    evidence: [
      { kind: 'GRAIN_CELL', species: 'yellow-poplar', grind: 'COMPOUND', condition: 'SEASONED', label: 'Seasoned yellow-poplar × compound', summary: 'demo: 10 results, 5 athletes, median ratio 0.97' },
    ],
    body: `${DEMO}

# What we saw

| bevel (included) | trials | depth per swing (demo) | edges chipped |
| ---: | ---: | ---: | ---: |
| 14° | 5 | 36 mm | 2 |
| 16° | 6 | 36 mm | 0 |

Seasoned yellow-poplar is harder than the green aspen we usually race. The steeper compound edge cut as deep and survived the session.

${COACHING_CAUTION}`,
  },
];
