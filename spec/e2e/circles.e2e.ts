import type { BrowserContext, Page } from 'playwright-core';

import { testInbox } from '../support/test-server';
import { seriousViolations } from './support/axe';
import { useServerAndBrowser } from './support/harness';
import { registerThroughApi, signInThroughUi } from './support/reader';

/** A reader signed in in their own browser context (their own device). */
async function device(harness: ReturnType<typeof useServerAndBrowser>, name: string): Promise<{ context: BrowserContext; page: Page; email: string }> {
  const reader = await registerThroughApi(harness.server.baseUrl, name);
  const context = await harness.browser.newContext({ viewport: { width: 390, height: 844 } });
  const page = await context.newPage();
  await signInThroughUi(page, harness.server.baseUrl, reader.user.email, reader.password);
  return { context, page, email: reader.user.email };
}

/** How many circle changes wait in the page's outbox (IndexedDB `circleOutbox`). */
async function circleOutbox(page: Page): Promise<number> {
  const name = await page.evaluate(async () => (await indexedDB.databases()).find((db) => db.name?.startsWith('lamplight-journal-'))?.name);
  return page.evaluate(
    (journal) =>
      new Promise<number>((resolve) => {
        const open = indexedDB.open(journal);
        open.onsuccess = () => {
          const count = open.result.transaction('circleOutbox').objectStore('circleOutbox').count();
          count.onsuccess = () => (open.result.close(), resolve(count.result));
        };
      }),
    name!,
  );
}

/** Waits (10 s at most) until the page's circle outbox is empty: its changes reached the server. */
async function outboxEmptied(page: Page): Promise<number> {
  for (let i = 0; i < 100 && (await circleOutbox(page)) > 0; i++) await new Promise((resolve) => setTimeout(resolve, 100));
  return circleOutbox(page);
}

/** Whether the page is wider than the phone (something overflows sideways). */
const overflows = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth > document.documentElement.clientWidth + 1);

describe('Reading circles in three browsers', () => {
  const harness = useServerAndBrowser();
  const contexts: BrowserContext[] = [];
  afterAll(async () => {
    for (const context of contexts) await context.close();
  });

  it('creates a circle, invites through the inbox, joins by code, shields a later part, and reveals it after reading past it offline', async () => {
    const base = harness.server.baseUrl;
    const host = await device(harness, 'Isolde Farrow');
    const ada = await device(harness, 'Ada Quennell');
    const bram = await device(harness, 'Bram Okonkwo-Hale');
    contexts.push(host.context, ada.context, bram.context);

    // The host starts the circle.
    await host.page.goto(`${base}/circles`);
    await host.page.getByLabel('Circle name').fill('The Tidewater Readers');
    await host.page.getByRole('button', { name: 'Start the circle' }).click();
    await host.page.getByRole('heading', { name: 'The Tidewater Readers' }).waitFor();
    const circleUrl = host.page.url();

    // Ada is invited by e-mail and joins through the link the local inbox caught.
    await host.page.getByLabel('E-mail address').fill(ada.email);
    await host.page.getByRole('button', { name: 'Send the invitation' }).click();
    const mail = await (await testInbox()).inbox.waitFor((m) => m.to.includes(ada.email) && m.subject.includes('reading circle'));
    const token = /#invite=([A-Za-z0-9_.-]+)/.exec(mail.text)![1]!;
    await ada.page.goto(`${base}/circles/join#invite=${token}`);
    await ada.page.getByRole('button', { name: 'Join the circle' }).click();
    await ada.page.getByRole('heading', { name: 'The Tidewater Readers' }).waitFor();

    // Bram joins with the join code.
    const code = (await host.page.locator('.code').textContent())!.trim();
    await bram.page.goto(`${base}/circles`);
    await bram.page.getByLabel('Join code').fill(code);
    await bram.page.getByRole('button', { name: 'Join', exact: true }).click();
    await bram.page.getByRole('heading', { name: 'The Tidewater Readers' }).waitFor();

    // The host schedules a pick in two parts.
    await host.page.getByLabel('Title').fill('The Salt Clock');
    await host.page.getByLabel('Pages').fill('300');
    await host.page.getByRole('button', { name: 'Add the pick' }).click();
    await host.page.getByRole('heading', { name: 'The Salt Clock' }).waitFor();
    for (const [label, end] of [
      ['Part 1', 'p. 100'],
      ['Part 2', 'p. 200'],
    ] as const) {
      await host.page.getByRole('combobox', { name: 'Pick' }).click();
      await host.page.getByRole('option', { name: 'The Salt Clock' }).click();
      await host.page.getByLabel('Name of the part').fill(label);
      await host.page.getByLabel('Ends at').fill(end);
      await host.page.getByLabel('Meeting or checkpoint date').fill('2031-05-01');
      await host.page.getByRole('button', { name: 'Add the part' }).click();
      await host.page.getByText(label, { exact: true }).waitFor();
    }
    expect(await seriousViolations(host.page)).toEqual([]);
    expect(await overflows(host.page)).toBeFalse();
    await host.page.getByRole('button', { name: 'Sync this circle' }).click();

    // Ada has finished part 2 and posts about it.
    await ada.page.goto(circleUrl.replace(base, base));
    await ada.page.getByRole('button', { name: 'Sync this circle' }).click();
    await ada.page.getByText('Part 2', { exact: true }).waitFor();
    await ada.page.getByRole('link', { name: 'Discussion' }).nth(1).click();
    await ada.page.getByLabel('Your thoughts on this part').fill('The clockmaker was the tide all along!');
    await ada.page.getByRole('button', { name: 'Post', exact: true }).click();
    await ada.page.getByText('The clockmaker was the tide all along!').waitFor();
    expect(await outboxEmptied(ada.page))
      .withContext('the post left the outbox')
      .toBe(0);

    // Bram is past part 1 only: the post waits behind the shield.
    await bram.page.goto(circleUrl);
    await bram.page.getByRole('button', { name: 'Sync this circle' }).click();
    await bram.page.getByText('Part 2', { exact: true }).waitFor();
    await bram.page.getByRole('button', { name: "I'm past this part" }).first().click();
    await bram.page.getByRole('link', { name: 'Discussion' }).nth(1).click();
    await bram.page.getByText('You are not there yet').waitFor();
    expect(await bram.page.getByText('The clockmaker was the tide all along!').count()).toBe(0);
    expect(await seriousViolations(bram.page)).toEqual([]);

    // Offline, Bram reads past part 2 and says so; the post shows, and the mark syncs later.
    await bram.context.setOffline(true);
    await bram.page.getByRole('button', { name: "I'm past this part" }).click();
    await bram.page.getByText('The clockmaker was the tide all along!').waitFor();
    await bram.context.setOffline(false);
    await bram.page.evaluate(() => window.dispatchEvent(new Event('online')));
    expect(await outboxEmptied(bram.page)).toBe(0);
    expect(await overflows(bram.page)).toBeFalse();
  }, 300_000);
});
