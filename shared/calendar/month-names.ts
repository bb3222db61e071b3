/** English month names, January first (index = month − 1): the app's own wording is English. */
export const MONTH_NAMES = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'] as const;

/** The same, as three-letter labels for chart axes and heatmap columns ('Jan'). */
export const SHORT_MONTH_NAMES = MONTH_NAMES.map((name) => name.slice(0, 3));
