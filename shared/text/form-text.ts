/** What a form's text box means once saved: its trimmed text, or null when it holds only spaces. */
export const optionalText = (value: string): string | null => (value.trim() === '' ? null : value.trim());

/**
 * A comma- or line-separated list as typed into one box, as a list: items trimmed, empty ones
 * dropped, each once in the order first typed. "Nell Ashby, Tomas Reyes" → ['Nell Ashby', 'Tomas Reyes'].
 */
export const splitList = (value: string): string[] => [
  ...new Set(
    value
      .split(/[,\n]/)
      .map((item) => item.trim())
      .filter(Boolean),
  ),
];
