import type { DataSource, EntityManager } from 'typeorm';

import type { UploadMediaType } from '../../../shared/api/upload';

/** What is stored about an upload, with its bytes when they were asked for. */
export interface StoredUpload {
  readonly mediaType: UploadMediaType;
  readonly byteSize: number;
  readonly bytes: Buffer | null;
}

/**
 * Attempts at storing an image whose only owner is deleting their account at that very moment
 * (each attempt after the first follows such a removal; more than one in a row is unheard of).
 */
const STORE_ATTEMPTS = 3;

/** SQL for uploads: one stored copy per image (`uploads`), one row per reader who owns it. */
export class UploadStore {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * Stores the image unless it is already stored, and makes the reader an owner, in one
   * transaction. Answers 'added' when the reader became an owner just now, 'known' when they
   * had uploaded it before, and 'quota_full' (storing nothing) when it would take the covers
   * they own beyond `quotaBytes`. Uploads of one reader take turns on a transaction-scoped
   * advisory lock, so two at once cannot both slip under the quota.
   */
  async save(userId: string, upload: { id: string; mediaType: UploadMediaType; bytes: Buffer }, quotaBytes: number): Promise<'added' | 'known' | 'quota_full'> {
    return this.dataSource.transaction(async (manager) => {
      await manager.query(`SELECT pg_advisory_xact_lock(hashtextextended('upload-quota:' || $1, 0))`, [userId]);
      const usage: { owned: boolean; used: string }[] = await manager.query(
        `SELECT bool_or(u.id = $2) AS owned, coalesce(sum(u.byte_size), 0) AS used
           FROM upload_owners o JOIN uploads u ON u.id = o.upload_id WHERE o.user_id = $1`,
        [userId, upload.id],
      );
      if (usage[0]?.owned) return 'known';
      if (Number(usage[0]?.used ?? 0) + upload.bytes.length > quotaBytes) return 'quota_full';
      await storeOnce(manager, upload);
      const owned: unknown[] = await manager.query('INSERT INTO upload_owners (upload_id, user_id) VALUES ($1, $2) ON CONFLICT DO NOTHING RETURNING upload_id', [
        upload.id,
        userId,
      ]);
      return owned.length > 0 ? 'added' : 'known';
    });
  }

  /**
   * The upload if this reader owns it, or it is the cover of a circle they are in (uploaded by
   * one of its hosts), else null (whether or not someone else has it). Bytes are read only when
   * asked for, so a revalidation (304) does not load the image.
   */
  async read(userId: string, id: string, withBytes: boolean): Promise<StoredUpload | null> {
    const rows: { media_type: UploadMediaType; byte_size: number; bytes: Buffer | null }[] = await this.dataSource.query(
      `SELECT u.media_type, u.byte_size, CASE WHEN $3::boolean THEN u.bytes END AS bytes
         FROM uploads u
        WHERE u.id = $1
          AND (EXISTS (SELECT 1 FROM upload_owners o WHERE o.upload_id = u.id AND o.user_id = $2)
               -- A circle's cover: its members read it, when a host of the circle uploaded it (so no
               -- host can show members an image of another reader's by naming its hash).
               OR EXISTS (SELECT 1 FROM circle_rows c
                            JOIN circle_members m ON m.circle_id = c.circle_id AND m.user_id = $2
                            JOIN circle_members h ON h.circle_id = c.circle_id AND h.role = 'host'
                            JOIN upload_owners ho ON ho.upload_id = u.id AND ho.user_id = h.user_id
                           WHERE c.collection = 'circles' AND c.fields->>'coverId' = u.id
                             AND coalesce((c.fields->>'deleted')::boolean, false) = false))`,
      [id, userId, withBytes],
    );
    const row = rows[0];
    return row ? { mediaType: row.media_type, byteSize: row.byte_size, bytes: row.bytes } : null;
  }
}

/**
 * Inserts the image, or finds it already stored and holds it with FOR KEY SHARE (the lock our
 * owner row's foreign key takes anyway) so that `removeOrphanedUploads` in a concurrent account
 * deletion waits for this transaction and then sees the new owner. If such a deletion removed
 * the image first, the lock finds nothing and the image is inserted again.
 */
async function storeOnce(manager: EntityManager, upload: { id: string; mediaType: UploadMediaType; bytes: Buffer }): Promise<void> {
  for (let attempt = 1; attempt <= STORE_ATTEMPTS; attempt++) {
    const inserted: unknown[] = await manager.query(
      `INSERT INTO uploads (id, media_type, byte_size, bytes) VALUES ($1, $2, $3, $4)
       ON CONFLICT (id) DO NOTHING RETURNING id`,
      [upload.id, upload.mediaType, upload.bytes.length, upload.bytes],
    );
    if (inserted.length > 0) return;
    const kept: unknown[] = await manager.query('SELECT 1 FROM uploads WHERE id = $1 FOR KEY SHARE', [upload.id]);
    if (kept.length > 0) return;
  }
  throw new Error(`upload ${upload.id} was removed ${STORE_ATTEMPTS} times while being stored`);
}

/** Ids of the uploads a reader owns (read before their ownership rows go). */
export async function ownedUploadIds(manager: EntityManager, userId: string): Promise<string[]> {
  const rows: { upload_id: string }[] = await manager.query('SELECT upload_id FROM upload_owners WHERE user_id = $1', [userId]);
  return rows.map((row) => row.upload_id);
}

/**
 * Deletes those of the given uploads that nobody owns any more. The rows are locked first (in
 * id order, so two deletions cannot deadlock), which waits for any upload still adding an owner;
 * the DELETE that follows is a new statement, so it sees that owner once committed.
 */
export async function removeOrphanedUploads(manager: EntityManager, uploadIds: readonly string[]): Promise<void> {
  if (uploadIds.length === 0) return;
  await manager.query('SELECT 1 FROM uploads WHERE id = ANY($1) ORDER BY id FOR UPDATE', [uploadIds]);
  await manager.query(
    `DELETE FROM uploads u
      WHERE u.id = ANY($1) AND NOT EXISTS (SELECT 1 FROM upload_owners o WHERE o.upload_id = u.id)`,
    [uploadIds],
  );
}
