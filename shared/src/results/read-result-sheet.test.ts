import { describe, expect, it } from '@jest/globals';

import { readResultSheet } from './read-result-sheet.js';

const HEADER = 'Event,Division,Club,Athletes,Time,Penalty,Status,Reason,Axe label,Grind,Bevel angle,Chisel width,Species,Diameter,Condition';
const sheet = (...rows: string[]): string => [HEADER, ...rows].join('\r\n');

describe('readResultSheet', () => {
  it('reads a full row into hundredths, millimetres and the stored spellings', () => {
    const read = readResultSheet(sheet(`Underhand chop,Men's,LARCH,Bram Dunmere,41.37 / 41.52,5,,,Race 3,Convex,32°,1/4 in,eastern white pine,12 in,green/wet`));
    expect(read).toEqual({
      ok: true,
      rows: [{
        row: 2,
        event: 'Underhand chop',
        division: 'MENS',
        club: 'LARCH',
        athletes: ['Bram Dunmere'],
        // Hand-worked: 41.37 s = 4137 hundredths, 41.52 s = 4152.
        rawTimes: [4137, 4152],
        score: null,
        penaltySeconds: 5,
        status: 'FINISHED',
        reason: null,
        axeLabel: 'Race 3',
        grind: 'CONVEX',
        bevelIncludedDeg: 32,
        // 1/4 in × 25.4 mm/in = 6.35 mm exactly (NIST SP 811, App. B.8).
        chiselWidthMm: 6.35,
        speciesId: 'eastern-white-pine',
        // 12 in = 304.8 mm exactly (NIST SP 811).
        diameterMm: 304.8,
        condition: 'GREEN',
      }],
    });
  });

  it('names the row and column of a bad time, as the import guide shows', () => {
    // The issue's own example message: row 7, time: "1:5.3" is not m:ss.hh.
    const rows = ['Underhand chop,Mens,LARCH,A B,40.00', 'Underhand chop,Mens,LARCH,C D,40.00', 'Underhand chop,Mens,LARCH,E F,40.00',
      'Underhand chop,Mens,LARCH,G H,40.00', 'Underhand chop,Mens,LARCH,I J,40.00', 'Underhand chop,Mens,LARCH,K L,1:5.3'];
    const read = readResultSheet(['event,division,club,athletes,time', ...rows].join('\n'));
    expect(read).toEqual({ ok: false, errors: [{ row: 7, column: 'time', message: 'row 7, time: "1:5.3" is not m:ss.hh' }] });
  });

  it('lists every problem of every row, not just the first', () => {
    const read = readResultSheet(sheet(
      'Underhand chop,Coed,LARCH,Bram Dunmere,41.37,-2,,,,,,,,,',
      'Underhand chop,Mens,LARCH,,abc,,,,,,,,,12,mushy',
    ));
    expect(read.ok).toBe(false);
    if (read.ok) return;
    // Hand-worked from the rows: bad division and penalty in row 2; athletes, time, diameter, condition in row 3.
    expect(read.errors.map((e) => `${e.row} ${e.column}`)).toEqual([
      '2 division', '2 penalty', '3 athletes', '3 time', '3 diameter', '3 condition',
    ]);
    expect(read.errors.find((e) => e.column === 'diameter')?.message).toBe('row 3, diameter: "12" needs a unit (mm, cm, in or ")');
  });

  it('matches headers whatever their case and spacing, and accepts known aliases', () => {
    const read = readResultSheet(' EVENT , division,TEAM,athlete,Time 1, time_2 ,HITS\nHorizontal hits,Women’s,CFORK,Wren Oakhurst,12.00,12.10,3');
    expect(read.ok && read.rows[0]).toMatchObject({ club: 'CFORK', division: 'WOMENS', rawTimes: [1200, 1210], score: 3 });
  });

  it('refuses an unknown or doubled header and names the missing columns', () => {
    const read = readResultSheet('event,division,clubb,athletes,time,Time\nx');
    expect(read).toEqual({
      ok: false,
      errors: [
        { row: 1, column: 'clubb', message: 'row 1, clubb: is not a column Endgrain reads (see the import guide)' },
        { row: 1, column: 'time', message: 'row 1, time: appears twice in the header' },
        { row: 1, column: 'club', message: 'row 1, club: the sheet needs a "club" column' },
      ],
    });
  });

  it('asks a disqualification for its reason and reads the trade abbreviations', () => {
    const read = readResultSheet(sheet('Underhand chop,Mens,LARCH,A B,,,DQ,,,,,,,,', 'Underhand chop,Mens,LARCH,C D,,,DNF,,,,,,,,', 'Underhand chop,Mens,LARCH,E F,,,no time,,,,,,,,'));
    expect(read).toEqual({ ok: false, errors: [{ row: 2, column: 'reason', message: 'row 2, reason: a disqualification needs a reason' }] });
    const fixed = readResultSheet(sheet('Underhand chop,Mens,LARCH,A B,,,DQ,foot over the line,,,,,,,', 'Underhand chop,Mens,LARCH,C D,,,DNF,,,,,,,,', 'Underhand chop,Mens,LARCH,E F,,,no time,,,,,,,,'));
    expect(fixed.ok && fixed.rows.map((r) => r.status)).toEqual(['DISQUALIFIED', 'DID_NOT_FINISH', 'SCRATCH']);
  });

  it('refuses a row with neither a result nor a status', () => {
    expect(readResultSheet(sheet('Underhand chop,Mens,LARCH,A B,,,,,,,,,,,'))).toMatchObject({
      ok: false, errors: [{ row: 2, column: 'status' }],
    });
  });

  it('splits pairs on the ampersand and skips blank rows while keeping row numbers', () => {
    const read = readResultSheet(sheet(',,,,,,,,,,,,,,', 'Mixed double buck,Mixed,LARCH,"Maren Ashgrove &  Bram  Dunmere",1:02.5,,,,,,,,,,'));
    // Hand-worked: 1:02.5 = 62 s + 50 hundredths = 6250; the blank row 2 is skipped, the pair is row 3.
    expect(read.ok && read.rows).toMatchObject([{ row: 3, athletes: ['Maren Ashgrove', 'Bram Dunmere'], rawTimes: [6250] }]);
  });

  it('refuses more than three watches and a zero time', () => {
    const four = readResultSheet(sheet('Underhand chop,Mens,LARCH,A B,40/41/42/43,,,,,,,,,,'));
    expect(four.ok ? [] : four.errors.map((e) => e.message)).toEqual(['row 2, time: "40/41/42/43" holds more than three watch times']);
    const zero = readResultSheet(sheet('Underhand chop,Mens,LARCH,A B,0.00,,,,,,,,,,'));
    expect(zero.ok).toBe(false);
  });

  it('reports a broken quote in the file with its row', () => {
    expect(readResultSheet(`${HEADER}\n"Underhand chop,Mens`)).toEqual({
      ok: false, errors: [{ row: 2, column: 'file', message: 'row 2, file: a quoted field is never closed (a missing ")' }],
    });
  });

  it('refuses an empty sheet and a header without results', () => {
    expect(readResultSheet('')).toMatchObject({ ok: false, errors: [{ row: 1, column: 'file' }] });
    expect(readResultSheet(HEADER)).toMatchObject({ ok: false, errors: [{ row: 2, column: 'file' }] });
  });
});
