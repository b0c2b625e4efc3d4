import type { RequestHandler } from 'express';
import multer from 'multer';
import { PHOTO_MAX_BYTES } from '@/shared/api/build';

/**
 * One photo from a multipart form (field `photo`), held in memory up to 10 MB and never written
 * where the client chose: the photo service stores it under a name of its own. multer's refusals
 * become sentences: a file over the limit is 413, anything else wrong with the form 400.
 */
export const TOO_LARGE = 'The photo is larger than 10 MB. Send a smaller photo, or take it again at a lower resolution.';

const FORM_ERRORS: Record<string, [number, string]> = {
  LIMIT_FILE_SIZE: [413, TOO_LARGE],
  LIMIT_FILE_COUNT: [400, 'Send one photo per request, in the field "photo".'],
  LIMIT_UNEXPECTED_FILE: [400, 'Send the photo in the multipart field "photo", one photo per request.'],
  LIMIT_PART_COUNT: [400, 'The form has too many parts; send the photo and cableId or rackId only.'],
  LIMIT_FIELD_COUNT: [400, 'The form has too many fields; send the photo and cableId or rackId only.'],
  LIMIT_FIELD_KEY: [400, 'A form field name is too long.'],
  LIMIT_FIELD_VALUE: [400, 'A form field is too long.'],
  MISSING_FIELD_NAME: [400, 'A form field has no name.'],
};

export function photoUpload(): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 4, parts: 5, fieldSize: 4096, fieldNameSize: 100, headerPairs: 100 },
  }).single('photo');
  return (req, res, next) => {
    parse(req, res, (error: unknown) => {
      if (!error) return next();
      const known = error instanceof multer.MulterError ? FORM_ERRORS[error.code] : undefined;
      // Anything else the parser throws is about the bytes the client sent (a form cut short, a bad boundary).
      const [status, message] = known ?? [400, 'The upload is not a complete multipart form; send it again.'];
      res.status(status).json({ error: message });
    });
  };
}
