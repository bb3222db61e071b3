import { createHash } from 'node:crypto';

import { fileTypeFromBuffer } from 'file-type';
import { imageSize } from 'image-size';

import { UPLOAD_MEDIA_TYPES, type UploadMediaType, type UploadView } from '../../../shared/api/upload';
import type { StoredUpload, UploadStore } from '../data-access/upload-store';
import { AppError } from '../errors';
import { structureProblem } from './image-structure';

/**
 * The largest cover accepted, either way round: far beyond what a cover needs (the app resizes
 * to 600 px tall), small enough that decoding it on a phone is no burden (96 MB as RGBA).
 */
export const MAX_IMAGE_SIDES = { short: 4000, long: 6000 } as const;

/** image-size's name for each of our types. */
const SIZE_TYPE: Record<UploadMediaType, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };

const refused = (reason: string) => new AppError(400, 'unreadable_image', `This image cannot be used as a cover: ${reason}`, { file: reason });

/** Ids are hex SHA-256 digests, as `upload` makes them. */
export const UPLOAD_ID = /^[0-9a-f]{64}$/;

/** Cover images: checked, addressed by their content, and readable only by their owners. */
export class Uploads {
  constructor(
    private readonly store: UploadStore,
    private readonly quotaBytes = Number.POSITIVE_INFINITY,
  ) {}

  /**
   * Keeps an image for a reader. The type comes from the file's own first bytes (its magic
   * number, read by file-type), never from its name or the declared Content-Type; the real
   * dimensions from its header (image-size); and its whole container must parse, with nothing
   * before, inside or after it that is not image (OWASP File Upload Cheat Sheet). It is served
   * back only to its owners, as the type found here, with nosniff. `added` is false when this
   * reader had uploaded the same image before.
   */
  async upload(userId: string, bytes: Buffer): Promise<{ upload: UploadView; added: boolean }> {
    const detected = await fileTypeFromBuffer(bytes);
    const mediaType = UPLOAD_MEDIA_TYPES.find((type): type is UploadMediaType => type === detected?.mime);
    if (!mediaType) {
      throw new AppError(400, 'unsupported_type', 'Covers must be JPEG, PNG or WebP images', {
        file: 'must be a JPEG, PNG or WebP image',
      });
    }
    checkImage(mediaType, bytes);
    const id = createHash('sha256').update(bytes).digest('hex');
    const saved = await this.store.save(userId, { id, mediaType, bytes }, this.quotaBytes);
    if (saved === 'quota_full') {
      const megabytes = Math.round(this.quotaBytes / (1024 * 1024));
      throw new AppError(413, 'quota_full', `Your cover storage is full (${megabytes} MB); covers already saved stay as they are`, {
        file: `would go beyond your ${megabytes} MB of cover storage`,
      });
    }
    const added = saved === 'added';
    return { upload: { id, mediaType, byteSize: bytes.length }, added };
  }

  /** The upload if `userId` owns it; null for a malformed id, an unknown one or someone else's. */
  async read(userId: string, id: string, withBytes: boolean): Promise<StoredUpload | null> {
    if (!UPLOAD_ID.test(id)) return null;
    return this.store.read(userId, id, withBytes);
  }
}

/** Dimensions within MAX_IMAGE_SIDES, the header's type the same as the magic number's, a container that parses whole. */
function checkImage(mediaType: UploadMediaType, bytes: Buffer): void {
  let size: { width: number; height: number; type?: string };
  try {
    size = imageSize(bytes);
  } catch {
    throw refused('its header cannot be read');
  }
  if (size.type !== SIZE_TYPE[mediaType]) throw refused('its header does not match its type');
  const long = Math.max(size.width, size.height);
  const short = Math.min(size.width, size.height);
  if (!(short >= 1) || long > MAX_IMAGE_SIDES.long || short > MAX_IMAGE_SIDES.short) {
    throw refused(`it is ${size.width} × ${size.height} pixels; the most is ${MAX_IMAGE_SIDES.short} × ${MAX_IMAGE_SIDES.long}`);
  }
  const problem = structureProblem(mediaType, bytes);
  if (problem) throw refused(problem);
}
