import { Inject, Injectable } from '@nestjs/common';
import { DEFAULT_REFERENCE_MM, handicapMarks } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import type { HandicapMarkInput } from './dto/grain-map.filter.js';
import { InsightsRepository, isoDate } from './insights.repository.js';
import type { HandicapMarkModel, HandicapSheetModel } from './models/handicap.model.js';

const MAX_MARK_SECONDS = 3600;

/** Suggested handicap marks from each athlete's recent times, with the organiser's overrides. */
@Injectable()
export class HandicapService {
  constructor(@Inject(InsightsRepository) private readonly repo: InsightsRepository) {}

  async sheet(meetEventId: string): Promise<HandicapSheetModel> {
    const event = await this.repo.meetEvent(meetEventId);
    if (event === undefined) throw DomainError.notFound('That meet event');
    const blockDiameterMm = event.diameter_mm === null ? DEFAULT_REFERENCE_MM : Number(event.diameter_mm);
    const athletes = await this.repo.enteredAthletes(meetEventId);
    const history = await this.repo.history(athletes.map((a) => a.athlete_id), event.event_type_id, isoDate(event.starts_on));
    const meetNames = new Map<string, string>();
    const suggestion = handicapMarks(
      athletes.map((a) => ({
        athleteId: a.athlete_id,
        history: history
          .filter((h) => h.athlete_id === a.athlete_id)
          .map((h) => {
            const date = isoDate(h.meet_date);
            meetNames.set(date, h.meet_name);
            return { hundredths: Number(h.total_hundredths), diameterMm: Number(h.diameter_mm), date };
          }),
      })),
      { blockDiameterMm },
    );
    const overrides = new Map((await this.repo.overrides(meetEventId)).map((o) => [o.athleteId, o]));
    const names = new Map(athletes.map((a) => [a.athlete_id, a.name]));
    const marks: HandicapMarkModel[] = suggestion.marks.map((m) => {
      const override = overrides.get(m.athleteId);
      return {
        athleteId: m.athleteId,
        athleteName: names.get(m.athleteId) ?? m.athleteId,
        expectedHundredths: m.expectedHundredths,
        n: m.n,
        used: m.used.map((u) => ({ date: u.date, meetName: meetNames.get(u.date) ?? '', hundredths: u.hundredths, diameterMm: u.diameterMm, onBlockHundredths: u.onBlockHundredths })),
        suggestedSeconds: m.markSeconds,
        overrideSeconds: override?.markSeconds ?? null,
        overrideNote: override?.note ?? '',
        markSeconds: override?.markSeconds ?? m.markSeconds,
        flags: m.flags,
      };
    });
    // Start order: the first to start (mark 0) at the top; marks still to set at the end.
    marks.sort((a, b) => (a.markSeconds ?? Infinity) - (b.markSeconds ?? Infinity) || a.athleteName.localeCompare(b.athleteName));
    return {
      meetEventId,
      meetId: event.meet_id,
      meetName: event.meet_name,
      eventName: event.event_name,
      division: event.division,
      blockDiameterMm,
      convention: suggestion.convention,
      note: suggestion.note,
      marks,
    };
  }

  async setMarks(actor: AuthUser, meetEventId: string, marks: readonly HandicapMarkInput[]): Promise<HandicapSheetModel> {
    if ((await this.repo.meetEvent(meetEventId)) === undefined) throw DomainError.notFound('That meet event');
    const entered = new Set((await this.repo.enteredAthletes(meetEventId)).map((a) => a.athlete_id));
    const clean = marks.map((mark, index) => {
      if (!entered.has(mark.athleteId)) throw DomainError.badInput(`marks.${index}.athleteId`, 'That athlete is not entered in this event.');
      const seconds = mark.markSeconds ?? null;
      if (seconds !== null && !(Number.isInteger(seconds) && seconds >= 0 && seconds <= MAX_MARK_SECONDS)) {
        throw DomainError.badInput(`marks.${index}.markSeconds`, `A mark is whole seconds from 0 to ${MAX_MARK_SECONDS}.`);
      }
      return { athleteId: mark.athleteId, markSeconds: seconds, note: (mark.note ?? '').trim().slice(0, 200) };
    });
    await this.repo.saveOverrides(meetEventId, actor.id, clean);
    return this.sheet(meetEventId);
  }
}
