import { CreateUsers1764633600000 } from './1764633600000-create-users';

/** Migrations in the order they run; a new one is appended, never edited once landed. */
export const migrations = [CreateUsers1764633600000];
