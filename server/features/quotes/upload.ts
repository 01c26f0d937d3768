/**
 * Receiving one uploaded file and naming it safely. Names arrive as UTF-8 (`filename="café.pdf"`,
 * what browsers send) or RFC 5987 (`filename*=UTF-8''caf%C3%A9.pdf`); both are decoded, NFC-normalised
 * and cleaned of control characters and path parts. A malformed or truncated multipart body is the
 * sender's fault: 400 `malformed-upload`, never a 500.
 */
import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '../../lib/errors';

export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;
const MAX_NAME_CHARACTERS = 200;

/** C0 and C1 controls, DEL, and the bidirectional overrides that can disguise an extension. */
const UNSAFE_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;

/** A display name fit to store and to send back in a header: no path, no controls, at most 200 characters. */
export function cleanFilename(raw: string): string {
  const base = raw.normalize('NFC').replace(UNSAFE_CHARACTERS, '').split(/[\\/]/).pop() ?? '';
  const name = base.trim().replace(/^\.+/, '');
  const chars = Array.from(name); // by code point, so a cut never splits a surrogate pair
  if (chars.length <= MAX_NAME_CHARACTERS) return name || 'attachment';
  const dot = name.lastIndexOf('.');
  const ext = dot > 0 && name.length - dot <= 10 ? name.slice(dot) : '';
  return Array.from(name.slice(0, name.length - ext.length)).slice(0, MAX_NAME_CHARACTERS - ext.length).join('') + ext;
}

/** One file per request in the field "file", at most 20 MB, kept in memory until its content is checked. */
export function singleUpload(): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 10, parts: 12 },
    // browsers send the name's UTF-8 bytes as they are; busboy would otherwise read them as latin1
    defParamCharset: 'utf8',
  }).single('file');
  return (req, res, next) =>
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'too-large', 'The file is larger than 20 MB.', { file: 'at most 20 MB' }));
        return next(new HttpError(400, 'invalid-input', `Upload refused: ${err.message}.`, { [err.field ?? 'file']: err.message }));
      }
      // busboy's parse errors: "Unexpected end of form", "Malformed part header", "Boundary not found"
      const reason = err instanceof Error ? err.message : 'unreadable body';
      next(new HttpError(400, 'malformed-upload', `The upload could not be read (${reason}); send it again as multipart/form-data.`, { file: 'malformed upload' }));
    });
}
