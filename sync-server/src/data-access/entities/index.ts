import { DeviceSession } from './device-session.entity';
import { PasswordReset } from './password-reset.entity';
import { RefreshToken } from './refresh-token.entity';
import { User } from './user.entity';

/** Every entity the DataSource knows; add new ones here. */
export const entities = [User, DeviceSession, RefreshToken, PasswordReset];
