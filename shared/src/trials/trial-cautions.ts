/** The usual cautions any screen that describes or runs an axe test shows beside it. */
export const TRIAL_CAUTIONS: readonly string[] = [
  'Wear protective footwear, leg protection and eye protection for every swing.',
  'Keep a clear zone around the block; nobody stands within reach of a swing.',
  'Sheath every edge when it is not in the swing.',
  'Never test a competition edge in frozen wood.',
  'Take any axe with a loose head or a cracked handle out of use until it is fixed.',
  "These notes do not replace the sanctioning body's rules, local law or qualified coaching.",
];
