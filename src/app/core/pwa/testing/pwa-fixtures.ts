/** The text of the snackbar on screen, if any (its message only, not its button). */
export const snackBarText = (): string | null => document.querySelector('.mat-mdc-simple-snack-bar .mat-mdc-snack-bar-label')?.textContent?.trim() ?? null;

/** Makes `(display-mode: standalone)` match, as it does when Lamplight runs installed. Call in a spec. */
export function runAsInstalled(): void {
  const matchMedia = window.matchMedia.bind(window);
  spyOn(window, 'matchMedia').and.callFake((query: string) =>
    query === '(display-mode: standalone)' ? ({ matches: true, media: query } as MediaQueryList) : matchMedia(query),
  );
}

/** Safari on an iPhone, which has no install prompt. */
export const IPHONE_SAFARI =
  'Mozilla/5.0 (iPhone; CPU iPhone OS 18_5 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/18.5 Mobile/15E148 Safari/604.1';
