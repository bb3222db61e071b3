/**
 * Pairs of form fields whose boxes overlap or touch, hints and errors included: what a reader
 * sees when a two-line hint runs into the field below. Empty when every field has room.
 *
 * @param minGap the least space, in CSS pixels, there must be between two fields.
 */
export function fieldOverlaps(root: HTMLElement, minGap = 1): string[] {
  const fields = [...root.querySelectorAll<HTMLElement>('mat-form-field')].filter((field) => field.getClientRects().length > 0);
  const boxes = fields.map((field) => ({ name: field.querySelector('mat-label')?.textContent?.trim() ?? '?', box: outerBox(field) }));
  const problems: string[] = [];
  for (const [i, a] of boxes.entries()) {
    for (const b of boxes.slice(i + 1)) {
      const apartX = a.box.right + minGap <= b.box.left || b.box.right + minGap <= a.box.left;
      const apartY = a.box.bottom + minGap <= b.box.top || b.box.bottom + minGap <= a.box.top;
      if (!apartX && !apartY) problems.push(`${a.name} / ${b.name}`);
    }
  }
  return problems;
}

/** The field with everything drawn under it (its hint or error). */
function outerBox(field: HTMLElement): { left: number; right: number; top: number; bottom: number } {
  const parts = [field, ...field.querySelectorAll<HTMLElement>('mat-hint, mat-error, .mat-mdc-form-field-subscript-wrapper')];
  const rects = parts.map((part) => part.getBoundingClientRect()).filter((rect) => rect.width > 0 || rect.height > 0);
  return {
    left: Math.min(...rects.map((r) => r.left)),
    right: Math.max(...rects.map((r) => r.right)),
    top: Math.min(...rects.map((r) => r.top)),
    bottom: Math.max(...rects.map((r) => r.bottom)),
  };
}
