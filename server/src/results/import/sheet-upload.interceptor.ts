import { singleFileUploadInterceptor } from '../../common/uploads/single-file-upload.interceptor.js';

/** 5 MiB: 20,000 result rows with every column filled fit with room to spare. */
export const SHEET_LIMIT_BYTES = 5 * 1024 * 1024;
export const SHEET_FIELD = 'file';

/** One results sheet (CSV) in the "file" field. */
export const SheetUploadInterceptor = singleFileUploadInterceptor({
  field: SHEET_FIELD,
  limitBytes: SHEET_LIMIT_BYTES,
  messages: {
    tooLarge: `A results sheet must be ${SHEET_LIMIT_BYTES / 1024 / 1024} MB or smaller; split a larger one.`,
    notMultipart: 'Send the sheet as a multipart/form-data upload.',
    notOneFile: `Send one CSV file, in the form field "${SHEET_FIELD}".`,
  },
});
