import { createHash } from 'node:crypto';

import { fileTypeFromBuffer } from 'file-type';

import { UPLOAD_MEDIA_TYPES, type UploadMediaType, type UploadView } from '../../../shared/api/upload';
import type { StoredUpload, UploadStore } from '../data-access/upload-store';
import { AppError } from '../errors';

/** Ids are hex SHA-256 digests, as `upload` makes them. */
export const UPLOAD_ID = /^[0-9a-f]{64}$/;

/** Cover images: checked, addressed by their content, and readable only by their owners. */
export class Uploads {
  constructor(private readonly store: UploadStore) {}

  /**
   * Keeps an image for a reader. The type comes from the file's own first bytes (its magic
   * number, read by file-type), never from its name or the declared Content-Type. The image is
   * not decoded: it is served back only to its owners, as the type found here, with nosniff.
   * `added` is false when this reader had uploaded the same image before.
   */
  async upload(userId: string, bytes: Buffer): Promise<{ upload: UploadView; added: boolean }> {
    const detected = await fileTypeFromBuffer(bytes);
    const mediaType = UPLOAD_MEDIA_TYPES.find((type): type is UploadMediaType => type === detected?.mime);
    if (!mediaType) {
      throw new AppError(400, 'unsupported_type', 'Covers must be JPEG, PNG or WebP images', {
        file: 'must be a JPEG, PNG or WebP image',
      });
    }
    const id = createHash('sha256').update(bytes).digest('hex');
    const added = await this.store.save(userId, { id, mediaType, bytes });
    return { upload: { id, mediaType, byteSize: bytes.length }, added };
  }

  /** The upload if `userId` owns it; null for a malformed id, an unknown one or someone else's. */
  async read(userId: string, id: string, withBytes: boolean): Promise<StoredUpload | null> {
    if (!UPLOAD_ID.test(id)) return null;
    return this.store.read(userId, id, withBytes);
  }
}
