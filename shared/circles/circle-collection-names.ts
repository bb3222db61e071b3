/**
 * The circle collections' names alone (no validators), for the device's database declaration,
 * which is in the app's first bundle; circle-collections.ts declares each with its fields.
 */
export const CIRCLE_COLLECTION_NAMES = ['circles', 'circlePicks', 'circleParts', 'circlePosts', 'circleReactions', 'circleRsvps', 'circleProgress'] as const;
