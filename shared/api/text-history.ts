/** One version of a mergeable text, as `GET /api/texts/:collection/:rowId/:field/versions` lists it. */
export interface TextVersion {
  /** When this text was last seen in its ten-minute period (ISO 8601, UTC). */
  readonly savedAt: string;
  readonly text: string;
}

export interface TextVersionsResponse {
  /** Newest first, the last 30 days. */
  readonly versions: readonly TextVersion[];
}
