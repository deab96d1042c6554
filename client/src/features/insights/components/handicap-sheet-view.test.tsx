import { describe, expect, it, jest } from '@jest/globals';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';

import type { HandicapMark, HandicapSheet } from '../api/handicap-types.js';
import { HandicapSheetView } from './handicap-sheet-view.js';

const mark = (over: Partial<HandicapMark>): HandicapMark => ({
  athleteId: 'a1', athleteName: 'Orrin Quillfeather', expectedHundredths: 3050, n: 2, suggestedSeconds: 0, overrideSeconds: null, overrideNote: '', markSeconds: 0, flags: [],
  used: [{ date: '2025-10-04', meetName: 'Birchhollow Open', hundredths: 3000, diameterMm: 300, onBlockHundredths: 3000 }],
  ...over,
});

const sheet: HandicapSheet = {
  meetEventId: 'me1', meetId: 'm1', meetName: 'Fernwick Handicap', eventName: 'Underhand chop', division: 'MENS', blockDiameterMm: 300,
  convention: 'slowest starts first', note: 'Marks are whole seconds after "go".',
  marks: [
    mark({ athleteId: 'a2', athleteName: 'Tamsin Rookwood', expectedHundredths: 4550, n: 1, suggestedSeconds: 15, markSeconds: 15, flags: ['thin-history'],
      used: [{ date: '2025-09-20', meetName: 'Marrow Creek Days', hundredths: 5000, diameterMm: 330, onBlockHundredths: 4550 }] }),
    mark({}),
  ],
};

describe('HandicapSheetView', () => {
  it('shows each expected time, the results behind it, the suggestion and a thin-history flag', () => {
    render(<HandicapSheetView sheet={sheet} imperial={false} saving={false} onSave={() => undefined} />);
    // Each athlete's working is listed under them.
    // hand-worked: 4550 hundredths prints as 45.50 and 3050 as 30.50 (formatTime, m:ss.hh without a zero minute)
    expect(screen.getByRole('row', { name: /Tamsin Rookwood.*45\.50.*1 past time.*15/ })).toBeTruthy();
    expect(screen.getByRole('row', { name: /Orrin Quillfeather.*30\.50.*2 past times/ })).toBeTruthy();
    expect(screen.getByText('Thin history: check by hand')).toBeTruthy();
    expect(screen.getByText('2025-10-04 Birchhollow Open: 30.00 on 300 mm → 30.00')).toBeTruthy();
    expect(screen.getByRole('note')).toHaveProperty('textContent', expect.stringMatching(/no athlete mounts or swings before their mark/));
  });

  it('saves a typed override and clears one left blank', async () => {
    const onSave = jest.fn();
    render(<HandicapSheetView sheet={sheet} imperial={false} saving={false} onSave={onSave} />);
    await userEvent.type(screen.getByLabelText('Mark for Tamsin Rookwood'), '12');
    await userEvent.click(screen.getByRole('button', { name: 'Save marks' }));
    expect(onSave).toHaveBeenCalledWith([
      { athleteId: 'a2', markSeconds: 12, note: null },
      { athleteId: 'a1', markSeconds: null, note: null },
    ]);
  });

  it('refuses a mark that is not whole seconds', async () => {
    render(<HandicapSheetView sheet={sheet} imperial={false} saving={false} onSave={() => undefined} />);
    await userEvent.type(screen.getByLabelText('Mark for Orrin Quillfeather'), '7.5');
    expect(screen.getByText('Whole seconds, 0–999')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Save marks' })).toHaveProperty('disabled', true);
  });
});
