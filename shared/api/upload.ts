/**
 * The cover upload API (`POST /api/uploads`, `GET /api/uploads/:id`). Devices resize and
 * compress covers before uploading; the server checks the type by the file's own bytes.
 */

/** The image types a cover may be. PNG is allowed because some devices cannot encode WebP. */
export const UPLOAD_MEDIA_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

export type UploadMediaType = (typeof UPLOAD_MEDIA_TYPES)[number];

/** The multipart/form-data field that carries the image. */
export const UPLOAD_FIELD = 'file';

/**
 * The answer to an upload. `id` is the hex SHA-256 of the bytes, so the same image always has
 * the same id; `GET /api/uploads/<id>` reads it back.
 */
export interface UploadView {
  readonly id: string;
  readonly mediaType: UploadMediaType;
  readonly byteSize: number;
}
