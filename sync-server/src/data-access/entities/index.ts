import { SYNCED_ENTITIES } from '../synced-entities';
import { DeviceSession } from './device-session.entity';
import { PasswordReset } from './password-reset.entity';
import { RefreshToken } from './refresh-token.entity';
import { Upload } from './upload.entity';
import { UploadOwner } from './upload-owner.entity';
import { User } from './user.entity';

/**
 * Every entity the DataSource knows: the accounts' own tables here, and one generated from the
 * shared schema for each synced collection (`synced-entities.ts`). Uploads are not synced rows:
 * they have their own API.
 */
export const entities = [User, DeviceSession, RefreshToken, PasswordReset, Upload, UploadOwner, ...Object.values(SYNCED_ENTITIES)];
