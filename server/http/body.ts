import express, { type RequestHandler } from 'express';
import multer from 'multer';
import { sizeInWords } from '../../shared/api/file-size';
import { jsonTooDeep, TOO_DEEP_MESSAGE } from '../../shared/model/json-depth';
import { AppError } from './app-error';
import { findNulText, NUL_MESSAGE } from './nul-text';

/** JSON bodies: large enough for one panel's 20,000 bores, small enough to refuse abuse early. */
export const JSON_LIMIT = '2mb';
/** Job documents uploaded for import. */
export const UPLOAD_LIMIT_BYTES = 5 * 1024 * 1024;

/** 415 when the request carries a body of another type. An empty body passes: validation then says what is missing. */
function wrongType(req: express.Request, type: string): AppError | undefined {
  const empty = req.headers['content-length'] === '0';
  return !empty && req.is(type) === false ? new AppError(415, 'unsupported-media-type', `Send the request body as ${type}.`) : undefined;
}

/** 400 for a body nested past MAX_JSON_DEPTH; a thrown AppError keeps its status through the parser. */
export function tooDeep(what: string): AppError {
  return new AppError(400, 'too-deep', `${what} ${TOO_DEEP_MESSAGE}.`);
}

// The depth is read from the raw bytes before JSON.parse runs, so no walk over the parsed body
// (ours for NUL, zod's, the database driver's) can meet a nest deep enough to overflow the stack.
const parseJson = express.json({
  limit: JSON_LIMIT,
  verify: (_req, _res, raw) => {
    if (jsonTooDeep(raw.toString('latin1'))) throw tooDeep('The request body');
  },
});

/** For routes that take a JSON body. */
export const jsonBody: RequestHandler = (req, res, next) => {
  const refused = wrongType(req, 'application/json');
  if (refused) return next(refused);
  parseJson(req, res, (err?: unknown) => {
    if (err) return next(err);
    const nul = findNulText(req.body);
    next(nul === undefined ? undefined : new AppError(400, 'invalid-input', `${nul}: ${NUL_MESSAGE}`, { fields: { [nul]: NUL_MESSAGE } }));
  });
};

/**
 * For routes that take one uploaded file in the field `name`, kept in memory, of at most `maxBytes`.
 * A larger file answers 413 naming the limit. Busboy's own errors (a torn multipart body) are the
 * client's, so they answer 400 rather than 500.
 */
export function fileUpload(name: string, maxBytes = UPLOAD_LIMIT_BYTES): RequestHandler {
  // Browsers send a file's name as raw UTF-8 (HTML's multipart/form-data encoding); busboy reads Latin-1 unless told.
  const single = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1 }, defParamCharset: 'utf8' }).single(name);
  return (req, res, next) => {
    const refused = wrongType(req, 'multipart/form-data');
    if (refused) return next(refused);
    single(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        const message = `is larger than ${sizeInWords(maxBytes)}, the most this upload takes`;
        return next(new AppError(413, 'too-large', `${name}: the file ${message}.`, { fields: { [name]: message } }));
      }
      if (!err || err instanceof multer.MulterError) return next(err);
      const message = (err as Error).message;
      next(new AppError(400, 'invalid-upload', `${name}: ${message}`, { fields: { [name]: message } }));
    });
  };
}

/**
 * An uploaded file's name as the client gave it (busboy has already dropped any folder), kept printable
 * and short before it is shown, logged, stored or offered back as a download's name.
 */
export function uploadedFileName(file: Express.Multer.File): string {
  const name = file.originalname.replace(/[\u0000-\u001f\u007f]/g, '').trim().slice(0, 200);
  return name === '' ? 'upload' : name;
}
