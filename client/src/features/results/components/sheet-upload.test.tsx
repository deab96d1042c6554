import { describe, expect, it } from '@jest/globals';
import { screen, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import type { SheetUploadAnswer } from '../api/upload-sheet.js';
import { SheetUpload } from './sheet-upload.js';

const BAD: SheetUploadAnswer = { ok: false, message: 'The sheet has 1 problem; nothing was saved.', problems: [{ row: 7, column: 'time', message: 'row 7, time: "1:5.3" is not m:ss.hh' }] };
const GOOD: SheetUploadAnswer = {
  ok: true, imported: 1, unchanged: 0, dryRun: true,
  rows: [{ row: 2, event: 'Underhand chop', division: 'MENS', club: 'HPINE', athletes: 'Ansel Birchfield', status: 'FINISHED', officialHundredths: 4137, score: null, action: 'NEW' }],
};

describe('SheetUpload', () => {
  it('lists a sheet’s problems by row and column, then previews the fixed sheet and saves it', async () => {
    const calls: { name: string; dryRun: boolean }[] = [];
    const upload = async (_meet: string, file: File, options: { dryRun: boolean }): Promise<SheetUploadAnswer> => {
      calls.push({ name: file.name, dryRun: options.dryRun });
      if (file.name === 'bad.csv') return BAD;
      return options.dryRun ? GOOD : { ...GOOD, dryRun: false };
    };
    const { user, container } = renderWithProviders({ element: <SheetUpload meetId="meet-1" upload={upload} /> });
    const picker = container.querySelector('input[type="file"]') as HTMLInputElement;

    await user.upload(picker, new File(['event\n'], 'bad.csv', { type: 'text/csv' }));
    const problems = await screen.findByRole('table', { name: 'Problems in the sheet' });
    expect(within(problems).getAllByRole('row')[1]).toHaveTextContent('7timerow 7, time: "1:5.3" is not m:ss.hh');
    expect(screen.getByText(/1 problem in the sheet; nothing was saved/)).toBeInTheDocument();

    await user.upload(picker, new File(['event\n'], 'fixed.csv', { type: 'text/csv' }));
    const preview = await screen.findByRole('table', { name: 'Rows in the sheet' });
    expect(within(preview).getAllByRole('row')[1]).toHaveTextContent('Ansel Birchfield');
    expect(within(preview).getAllByRole('row')[1]).toHaveTextContent('41.37');
    await user.click(screen.getByRole('button', { name: 'Save 1 result' }));
    expect(await screen.findByText('Saved: 1 result added or changed, 0 already as in the sheet.')).toBeInTheDocument();
    expect(calls).toEqual([{ name: 'bad.csv', dryRun: true }, { name: 'fixed.csv', dryRun: true }, { name: 'fixed.csv', dryRun: false }]);
  });

  it('refuses a file over 5 MB before uploading it', async () => {
    let called = false;
    const upload = async (): Promise<SheetUploadAnswer> => {
      called = true;
      return GOOD;
    };
    const { user, container } = renderWithProviders({ element: <SheetUpload meetId="meet-1" upload={upload} /> });
    const big = new File([new Uint8Array(5 * 1024 * 1024 + 1)], 'huge.csv', { type: 'text/csv' });
    await user.upload(container.querySelector('input[type="file"]') as HTMLInputElement, big);
    expect(await screen.findByText(/larger than 5 MB/)).toBeInTheDocument();
    expect(called).toBe(false);
  });
});
