import { Router, type RequestHandler } from 'express';
import multer from 'multer';

import { UPLOAD_FIELD, type UploadView } from '../../../shared/api/upload';
import type { Uploads } from '../domain/uploads';
import { AppError } from '../errors';
import { callerOf } from './require-auth';

/** A year, and `immutable`: an id names one sequence of bytes for ever. */
const CACHE_CONTROL = 'private, max-age=31536000, immutable';

const ONE_FILE = `send exactly one image, in the multipart field "${UPLOAD_FIELD}"`;

/** Multer's and busboy's errors, as the API's own. */
function uploadError(err: unknown, maxBytes: number): unknown {
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') {
      return new AppError(413, 'too_large', `The image is larger than ${maxBytes} bytes`, { file: `must be at most ${maxBytes} bytes` });
    }
    if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') {
      return new AppError(400, 'invalid_input', 'Some fields need attention', { file: ONE_FILE });
    }
    return new AppError(400, 'invalid_input', 'The upload form has more than an image in it', { body: ONE_FILE });
  }
  // Anything else from parsing is busboy finding the body malformed (or cut short).
  return new AppError(400, 'invalid_input', 'The upload is not well-formed multipart/form-data', { body: ONE_FILE });
}

/**
 * Reads the one file into memory (covers are small, and the bytes are hashed and stored whole).
 * Part headers are read as UTF-8, as browsers send them; text fields are capped, not used.
 */
function receiveOneFile(maxBytes: number): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    defParamCharset: 'utf8',
    limits: { fileSize: maxBytes, files: 1, fields: 10, fieldSize: 1024, parts: 11 },
  }).single(UPLOAD_FIELD);
  return (req, res, next) => {
    parse(req, res, (err?: unknown) => next(err === undefined ? undefined : uploadError(err, maxBytes)));
  };
}

/** Whether an If-None-Match list names `etag` (weak comparison, RFC 9110 §13.1.2), or is `*`. */
function matchesIfNoneMatch(header: string | undefined, etag: string): boolean {
  if (!header) return false;
  return header.split(',').some((tag) => {
    const trimmed = tag.trim();
    return trimmed === '*' || trimmed.replace(/^W\//, '') === etag;
  });
}

/**
 * `/api/uploads` (behind requireAuth): cover images. An upload answers 201 when the image is
 * new to this reader and 200 when they had uploaded it before, with the same id either way. It
 * does not tell whether another reader holds the same image.
 */
export function uploadsRoutes(uploads: Uploads, maxBytes: number): Router {
  const router = Router();

  router.post('/', receiveOneFile(maxBytes), async (req, res) => {
    if (!req.file?.buffer) {
      throw new AppError(400, 'invalid_input', 'Choose an image to upload', { file: `is required: ${ONE_FILE}` });
    }
    const { upload, added } = await uploads.upload(callerOf(res).userId, req.file.buffer);
    if (added) res.status(201).location(`/api/uploads/${upload.id}`);
    res.json(upload satisfies UploadView);
  });

  router.get('/:id', async (req, res) => {
    const id = req.params['id']!;
    const etag = `"${id}"`;
    const notModified = matchesIfNoneMatch(req.get('if-none-match'), etag);
    const found = await uploads.read(callerOf(res).userId, id, !notModified);
    // Unknown, malformed and someone else's ids all look the same.
    if (!found) throw new AppError(404, 'not_found', 'No such upload');
    res.set({ ETag: etag, 'Cache-Control': CACHE_CONTROL, 'X-Content-Type-Options': 'nosniff' });
    if (notModified) {
      res.status(304).end();
      return;
    }
    res.type(found.mediaType).send(found.bytes);
  });

  return router;
}
