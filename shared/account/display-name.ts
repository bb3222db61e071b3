/**
 * Display names are shown to people a reader shares with; keep them short and printable. Apart
 * from the accounts API (shared/api/auth.ts), so the register page has it without that file's zod.
 */
export const DISPLAY_NAME_MAX_LENGTH = 80;
