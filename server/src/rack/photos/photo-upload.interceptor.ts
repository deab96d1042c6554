import { singleFileUploadInterceptor } from '../../common/uploads/single-file-upload.interceptor.js';

/** 8 MiB: a full-size phone photo fits; a video renamed to .jpg does not. */
export const PHOTO_LIMIT_BYTES = 8 * 1024 * 1024;
export const PHOTO_FIELD = 'photo';

/** One picture in the "photo" field (axe photos and Field Notes images). */
export const PhotoUploadInterceptor = singleFileUploadInterceptor({
  field: PHOTO_FIELD,
  limitBytes: PHOTO_LIMIT_BYTES,
  messages: {
    tooLarge: `Photos must be ${PHOTO_LIMIT_BYTES / 1024 / 1024} MB or smaller; that file is larger.`,
    notMultipart: 'Send the photo as a multipart/form-data upload.',
    notOneFile: `Send one picture, in the form field "${PHOTO_FIELD}".`,
  },
});
