import { checkEveryScreenAt, TABLET } from './support/every-screen';
import { useServerAndBrowser } from './support/harness';

describe('Every screen at a tablet upright (768 × 1024)', () => {
  const harness = useServerAndBrowser();

  it('fits the window (no sideways scrolling) and has no serious or critical axe findings, signed in as a reader with a library', async () => {
    await checkEveryScreenAt(harness, TABLET);
  }, 600_000);
});
