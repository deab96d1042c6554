import { COACHING_CAUTION, type SeedNote } from './seed-note.js';

const CURATOR = 'admin@example.org';

/** First Cuts, steps 1–4: written for the demo league, in our own words. */
export const FIRST_CUTS_PART_ONE: SeedNote[] = [
  {
    slug: 'safety-first',
    kind: 'SAFETY_NOTE',
    authorEmail: CURATOR,
    title: 'Safety first: before you lift an axe',
    summary: 'What to wear, where to stand and when to stop, before your first swing at practice.',
    publishedOn: '2026-09-02',
    tags: { free: ['first cuts', 'protective gear'] },
    body: `Every skill in First Cuts starts here. Read this before your first practice, and again before your first meet.

# Dress for the axe, not the weather

- **Boots** with a protective toe, laced high. Never chop in trainers or open shoes.
- **Leg protection**: chain-mail or cut-resistant socks and shin guards for the underhand chop; your coach will say what your club and host require.
- **Eye protection** for everyone inside the chopping area, including the person holding the stopwatch.
- Gloves only where your coach allows them: a glove can change your grip without you noticing.

# Keep a clear zone

- Before every swing, look all the way round: nobody within two axe lengths, nothing overhead, nothing underfoot.
- Spectators stay behind the rope or line. If someone steps in, stop and lower the axe.
- Carry an axe with the edge **sheathed** and pointed down and away from your body.

# Know when to stop

| Stop and tell your coach when… | Why |
| --- | --- |
| the head moves on the handle | a loose head can fly off |
| the handle shows a crack or a split | it can break mid-swing |
| the block is frozen | racing edges chip, and the axe can glance off |
| you are tired or cold | tired swings are the ones that miss |

Put the axe down, sheath it, and walk away if anything feels wrong. Nobody wins a practice.

${COACHING_CAUTION}`,
  },
  {
    slug: 'picking-a-block-and-a-face',
    kind: 'GUIDE',
    authorEmail: CURATOR,
    title: 'Picking a block and a face',
    summary: 'How to read a block before you cut it: species, moisture, knots, and where to open your face.',
    publishedOn: '2026-09-06',
    tags: { species: ['eastern-white-pine', 'quaking-aspen'], events: ['underhand-chop', 'standing-block-chop'], conditions: ['GREEN', 'SEASONED', 'KNOTTY'], free: ['first cuts'] },
    body: `At a meet the host hands you a block. At practice you often choose one, and learning to read it is half of chopping well.

# Look at the end grain

- **Growth rings** wide apart usually mean softer, faster wood; tight rings, slower.
- **Colour and feel**: a block that is heavy for its size and cold to the touch is wet (green). Dry wood sounds sharper when knocked.
- **Checks** (cracks from the end) can open under the axe; ask your coach before using a badly checked block.

# Find the knots

Knots are hard and the grain bends round them. Turn the block and look for bumps in the bark or dark spots on the end. Put your cut away from them where the rules allow you to choose.

# Open the face

For a horizontal cut, most coaches teach you to open the face at roughly 45° to the grain (common practice), alternating a cut from above and one from below so the chip comes free. Aim for a face about as wide as the block is thick; a narrow face makes you chop deeper, not faster.

1. Mark your line with a light tap, not a swing.
2. Take the top cut, then the bottom cut, and check the chip came out.
3. Keep your feet and shins out of the line of the swing at every stroke.

# Write it down

Note the species, the diameter, and whether the block was green, seasoned, dry, frozen, punky or knotty. Endgrain asks for these with every result and trial, because the same axe behaves differently in each.

${COACHING_CAUTION}`,
  },
  {
    slug: 'testing-an-axe-against-a-reference',
    kind: 'GUIDE',
    authorEmail: CURATOR,
    title: 'Testing an axe against a reference',
    summary: 'A fair way to compare two axes on one block: same tester, same swings, one reference axe.',
    publishedOn: '2026-09-12',
    tags: { grinds: ['FLAT', 'CHISEL'], events: ['underhand-chop'], free: ['first cuts', 'trials'] },
    body: `"This axe feels faster" is a feeling. A trial turns it into a number you can compare with your teammates'.

# Set up

- One block, one species, one condition. Record the diameter.
- Pick a **reference axe**: a well-known axe from your rack that every trial on this block is compared with.
- The same tester swings the reference and the axe being tested, fresh, with the same number of swings.

# Swing and measure

1. Take a few opening strokes to set the face; mark them as opening strokes so they are not counted.
2. Take the counted swings and measure how deep each one went, in millimetres.
3. Note how the bit came out of the wood: from grabbing to springing free.
4. Note how keen the edge felt: dull, working or keen.

Endgrain works out the depth per counted swing and the ratio to the reference axe. A ratio of 1.10 means the axe went about 10 % deeper per swing than the reference on that block.

# Read it honestly

| What you see | What it means |
| --- | --- |
| one tester, one block | a hint, not a verdict |
| the same result from two testers | worth talking about |
| an axe that goes deeper but binds | slower in a race than it looks |

Never test a competition edge in frozen wood, and keep the clear zone while you measure: lower and sheath the axe before anyone steps up to the block with a ruler.

${COACHING_CAUTION}`,
  },
  {
    slug: 'caring-for-an-edge',
    kind: 'GUIDE',
    authorEmail: CURATOR,
    title: 'Caring for an edge',
    summary: 'Sheaths, honing, and when a racing edge needs more than a touch-up.',
    publishedOn: '2026-09-19',
    tags: { grinds: ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'], free: ['first cuts', 'sharpening'] },
    body: `A racing axe is sharpened far beyond a general-purpose axe. Treat it like the tool that can hurt you most in the shed.

# Every time

- **Sheath it** whenever it is not in your hands. An edge left bare on a bench has cut more people than any block.
- Wipe it dry after practice; sap and water dull an edge and start rust.
- Carry it edge down, away from your body, never on your shoulder.

# Honing

Honing keeps the edge you have. Your coach or the club's sharpener will show you the stone, the angle and the strokes they use; do not learn this from a video.

- Hone only with the axe held firmly in a vice or a jig, never on your knee.
- Keep your fingers behind the edge, and wear cut-resistant gloves if your club asks.
- Log every hone and regrind in the Rack, so the next person knows what the edge has been through.

# When it needs more

| Sign | Likely fix |
| --- | --- |
| a chip or a rolled section | regrind, by the club's sharpener |
| the bit grabs where it used to spring free | check the grind and the chisel width |
| a shiny flat line along the edge | the edge is dull: hone or regrind |

Racing bevels are thin: many run from about 13° to 18° included, against about 30° near the edge of a general felling axe. That thinness is why they chip in frozen or knotty wood.

${COACHING_CAUTION}`,
  },
];
