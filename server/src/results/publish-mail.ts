import { DIVISION_LABELS, formatTime, type Division } from '@endgrain/shared';

import type { OutgoingMail } from '../mail/mail.service.js';
import type { ResultModel } from './models/result.model.js';
import type { MeetStandingsModel } from './models/standings.model.js';

export interface PlacingsMail {
  to: string;
  coachName: string;
  clubId: string;
  clubName: string;
}

const ORDINAL = (n: number): string => {
  const tens = n % 100;
  if (tens >= 11 && tens <= 13) return `${n}th`;
  return `${n}${['th', 'st', 'nd', 'rd'][n % 10] ?? 'th'}`;
};

/** The e-mail a coach gets when a meet's results are published: the club's placings and totals. */
export function placingsMail(mail: PlacingsMail, meet: { name: string; startsOn: string; link: string }, results: readonly ResultModel[], standings: MeetStandingsModel): OutgoingMail {
  const mine = results.filter((r) => r.clubId === mail.clubId);
  const lines = mine.map((r) => `- ${r.eventName} (${DIVISION_LABELS[r.division as Division]}): ${r.label}: ${outcome(r)}`);
  const totals = standings.divisions.flatMap((d) =>
    d.clubs.filter((c) => c.clubId === mail.clubId).map((c) => `- ${DIVISION_LABELS[d.division as Division]}: ${c.tied ? 'tied ' : ''}${ORDINAL(c.place)} of ${d.clubs.length}, ${c.points} points`),
  );
  const text = [
    `Hello ${mail.coachName},`,
    '',
    `The results of ${meet.name} (${meet.startsOn}) are published.`,
    '',
    `${mail.clubName}, event by event:`,
    ...(lines.length ? lines : ['- no results for the club']),
    '',
    'Team totals:',
    ...(totals.length ? totals : ['- none']),
    '',
    `Every result and the standings: ${meet.link}`,
    '',
    'Spotted a mistake? Reply to the meet organiser; corrections are made with a reason and kept on record.',
  ].join('\n');
  return { to: mail.to, subject: `Results are out: ${meet.name}`, text };
}

function outcome(r: ResultModel): string {
  const points = `${r.points} ${r.points === 1 ? 'point' : 'points'}`;
  if (r.place === null) {
    const label = { FINISHED: 'finished', SCRATCH: 'scratch', DID_NOT_FINISH: 'did not finish', DISQUALIFIED: 'disqualified' }[r.status];
    return `${label}${r.reason ? ` (${r.reason})` : ''}, ${points}`;
  }
  const mark = r.resultKind === 'TIMED' ? (r.totalHundredths === null ? '' : formatTime(r.totalHundredths)) : `${r.score ?? 0}${r.resultKind === 'FEWEST_HITS' ? ' hits' : ''}`;
  return `${r.tied ? 'tied ' : ''}${ORDINAL(r.place)}, ${mark}, ${points}`;
}
