/** What a reading goal counts, in the order screens list them. */
export const GOAL_UNITS = ['books', 'pages', 'minutes'] as const;

/** One of `GOAL_UNITS`. A goal may set a target for any of them. */
export type GoalUnit = (typeof GOAL_UNITS)[number];

/** Targets (or amounts read) by unit; a unit left out has no target. */
export type AmountsByUnit = Partial<Readonly<Record<GoalUnit, number>>>;
