import type { Entry } from '../api/types.js';

export interface Heat {
  heat: number;
  entries: Entry[];
}

export interface Order {
  heats: Heat[];
  /** Entries made after the draw: they have no place until the event is drawn again. */
  undrawn: Entry[];
}

/** Drawn entries by heat, each heat in draw order; null when the event has not been drawn. */
export function orderOfCompetition(entries: readonly Entry[]): Order | null {
  const drawn = entries.filter((entry) => entry.drawPosition !== null && entry.heat !== null);
  if (drawn.length === 0) return null;
  const heats = new Map<number, Entry[]>();
  for (const entry of [...drawn].sort((a, b) => a.drawPosition! - b.drawPosition!)) {
    heats.set(entry.heat!, [...(heats.get(entry.heat!) ?? []), entry]);
  }
  return {
    heats: [...heats.entries()].sort(([a], [b]) => a - b).map(([heat, inHeat]) => ({ heat, entries: inHeat })),
    undrawn: entries.filter((entry) => !drawn.includes(entry)),
  };
}
