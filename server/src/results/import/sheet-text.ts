/** What multer hands over for one uploaded file. */
export interface UploadedSheet {
  originalname: string;
  mimetype: string;
  size: number;
  buffer: Buffer;
}

// Browsers name CSV differently: Windows often sends the old Excel type for .csv files.
const CSV_TYPES = ['text/csv', 'application/csv', 'text/plain', 'application/vnd.ms-excel', 'application/octet-stream', 'text/comma-separated-values'];

export type SheetText = { ok: true; text: string } | { ok: false; message: string };

/** Checks an upload is a CSV text file and decodes it as UTF-8 (refusing, not guessing, other encodings). */
export function sheetText(file: UploadedSheet | undefined): SheetText {
  if (!file) return { ok: false, message: 'no file came with the upload; send the sheet in the form field "file"' };
  if (file.buffer.subarray(0, 2).toString('latin1') === 'PK') {
    return { ok: false, message: 'this is a spreadsheet workbook, not CSV; save it as "CSV UTF-8" and upload that' };
  }
  if (!/\.(csv|txt)$/i.test(file.originalname) || !CSV_TYPES.includes(file.mimetype.toLowerCase().split(';')[0]!.trim())) {
    return { ok: false, message: `"${file.originalname}" is not a CSV file; upload a .csv sheet` };
  }
  if (file.buffer.includes(0)) return { ok: false, message: 'the file holds binary data; upload the sheet as CSV text' };
  try {
    return { ok: true, text: new TextDecoder('utf-8', { fatal: true }).decode(file.buffer) };
  } catch {
    return { ok: false, message: 'the file is not UTF-8 text; save it as "CSV UTF-8" and upload it again' };
  }
}
