import { User } from './user.entity';

/** Every entity the DataSource knows; add new ones here. */
export const entities = [User];
