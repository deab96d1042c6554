import { DivisionEnum, ExperienceEnum } from '../../league/models/league.enums.js';
import type { EntryEntity } from '../../meets/entities/entry.entity.js';
import type { LineupAssignmentEntity } from '../entities/lineup-assignment.entity.js';
import type { LineupOverrideEntity } from '../entities/lineup-override.entity.js';
import type { LineupAssignmentModel, LineupEntryModel, LineupOverrideModel } from '../models/lineup.model.js';
import { AxeStatusEnum, AxeUseEnum } from '../models/rack.enums.js';
import { checkLineup } from './lineup-rules.js';

export const athleteName = (a: { firstName: string; lastName: string } | null | undefined): string => (a ? `${a.firstName} ${a.lastName}` : '');

export function toOverrideModel(o: LineupOverrideEntity): LineupOverrideModel {
  return {
    id: o.id,
    entryId: o.entryId,
    athleteName: o.athleteName,
    athleteExperience: ExperienceEnum[o.athleteExperience],
    axeLabel: o.axeLabel,
    axeAllowedFor: AxeUseEnum[o.axeAllowedFor],
    reason: o.reason,
    byName: o.byName,
    at: o.createdAt,
  };
}

export function toAssignmentModel(a: LineupAssignmentEntity, override: LineupOverrideEntity | undefined): LineupAssignmentModel {
  return {
    entryId: a.entryId,
    athleteId: a.athleteId,
    athleteName: athleteName(a.athlete),
    axeId: a.axeId,
    axeLabel: a.axe?.label ?? null,
    axeStatus: a.axe ? AxeStatusEnum[a.axe.status] : null,
    override: override ? toOverrideModel(override) : null,
    updatedAt: a.updatedAt,
  };
}

const heatKey = (e: EntryEntity, axeId: string | null) => (axeId && e.heat !== null ? `${e.meetEventId}|${e.heat}|${axeId}` : null);

/** The club's entries with their assignments, re-checked against the rack as it stands now. */
export function toLineupEntries(
  entries: EntryEntity[],
  assignments: Map<string, LineupAssignmentEntity>,
  overrides: Map<string, LineupOverrideEntity>,
): LineupEntryModel[] {
  const holders = new Map<string, string[]>();
  for (const e of entries) {
    const a = assignments.get(e.id);
    const key = heatKey(e, a?.axeId ?? null);
    if (a && key) holders.set(key, [...(holders.get(key) ?? []), athleteName(a.athlete)]);
  }
  return entries.map((e) => {
    const a = assignments.get(e.id);
    const override = a?.overrideId ? overrides.get(a.overrideId) : undefined;
    let warnings: string[] = [];
    if (a?.axe && a.athlete) {
      const key = heatKey(e, a.axeId);
      const me = athleteName(a.athlete);
      const verdict = checkLineup({
        athlete: { name: me, experience: a.athlete.experience },
        axe: a.axe,
        overrideReason: override?.reason ?? null,
        sameHeatAthletes: key ? (holders.get(key) ?? []).filter((n) => n !== me) : [],
      });
      warnings = verdict.ok ? verdict.warnings : [verdict.message];
    }
    return {
      entryId: e.id,
      meetEventId: e.meetEventId,
      eventName: e.meetEvent?.eventType?.name ?? '',
      division: DivisionEnum[e.meetEvent.division],
      heat: e.heat,
      usesHead: Boolean(e.meetEvent?.eventType?.usesHead),
      athletes: [...(e.athletes ?? [])]
        .sort((x, y) => x.position - y.position)
        .map((ea) => ({ id: ea.athleteId, name: athleteName(ea.athlete), experience: ExperienceEnum[ea.athlete.experience] })),
      assignment: a ? toAssignmentModel(a, override) : null,
      warnings,
    };
  });
}
