import { provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed, type ComponentFixture } from '@angular/core/testing';

import { Auth } from '../../../core/auth/auth';
import { textOf } from '../../../core/testing/goal-fixtures';
import { openTestJournal, until, type TestJournal } from '../../../core/testing/test-journal';
import { PartDiscussion } from './part-discussion';

const CIRCLE = '00000000-0000-4000-8000-00000000d101';
const POST = '00000000-0000-4000-8000-00000000d111';
const FORMER = '00000000-0000-4000-8000-00000000d1ff';
const SLOW = 20_000;
/** What a hostile post tries: an image whose error runs script, a raw script, and a javascript: link. */
const HOSTILE =
  '**Loved it** <img src="x" onerror="window.pwned = 1"> <script>window.pwned = 2</script> [click me](javascript:window.pwned=3)\n> the sea keeps no ledgers';

/** The general conversation against a real IndexedDB journal: formatting is inert, former members, hosts fold posts away. */
describe('PartDiscussion', () => {
  let journal: TestJournal;
  let fixture: ComponentFixture<PartDiscussion>;
  const page = () => fixture.nativeElement as HTMLElement;
  const button = (name: string) =>
    [...page().querySelectorAll<HTMLButtonElement>('button')].find((b) => textOf(b) === name || b.getAttribute('aria-label') === name);

  async function open(role: 'host' | 'member', hidden = false): Promise<void> {
    journal = openTestJournal([provideHttpClientTesting()]);
    const { db } = journal;
    await db.open();
    const me = TestBed.inject(Auth).user()!.id;
    await db.circleMeta.put({ circleId: CIRCLE, role, members: [{ userId: me, displayName: 'Wren', role }] });
    await db.table('circles').put({ id: CIRCLE, circleId: CIRCLE, name: 'The Lantern Readers', _hlc: {} });
    await db
      .table('circlePosts')
      .put({ id: POST, circleId: CIRCLE, partId: null, text: HOSTILE, postedAt: '2031-03-01T10:00:00Z', hidden, _author: FORMER, _hlc: {} });
    fixture = TestBed.createComponent(PartDiscussion);
    fixture.componentRef.setInput('id', CIRCLE);
    fixture.componentRef.setInput('partId', 'general');
    await until(() => page().querySelector('.post') !== null, fixture, 10_000);
  }

  afterEach(async () => {
    fixture.destroy();
    await journal.close();
    delete (window as { pwned?: number }).pwned;
  });

  it(
    'shows light formatting and nothing a post tries to run, by "A former member"; a host folds it away',
    async () => {
      await open('host');
      const text = page().querySelector('.post .text')!;
      expect(text.querySelector('strong')?.textContent).toBe('Loved it');
      expect(text.querySelector('blockquote')).not.toBeNull();
      expect(text.querySelector('img, script, a, [onerror]')).toBeNull();
      expect(textOf(text)).toContain('<img src="x" onerror="window.pwned = 1">');
      await new Promise((resolve) => setTimeout(resolve, 50)); // an image error would have fired by now
      expect((window as { pwned?: number }).pwned).toBeUndefined();
      expect(textOf(page().querySelector('.post .by'))).toContain('A former member');

      button('Fold away')!.click();
      await until(() => !!button('Show again'), fixture);
      expect((await journal.db.table('circlePosts').get(POST)).hidden).toBeTrue();
      expect((await journal.db.circleOutbox.toArray()).map((entry) => [entry.field, entry.value])).toContain(['hidden', true]);
    },
    SLOW,
  );

  it(
    'tells a member a host folded a post away, and offers them no folding',
    async () => {
      await open('member', true);
      expect(textOf(page().querySelector('.post'))).toContain('A host folded this post away.');
      expect(page().querySelector('.post .text')).toBeNull();
      expect(button('Fold away')).toBeUndefined();
    },
    SLOW,
  );

  it(
    'puts a reply under its post, and a reaction of our own turns on and off, one row per reader, post and kind',
    async () => {
      await open('member');
      button('Reply')!.click();
      await until(() => page().querySelector('form[aria-label="Reply"] textarea') !== null, fixture);
      const box = page().querySelector<HTMLTextAreaElement>('form[aria-label="Reply"] textarea')!;
      // Typing stops where the schema would refuse the post (circlePosts.text: 4,000 characters).
      expect(box.maxLength).toBe(4000);
      expect(page().querySelector<HTMLTextAreaElement>('form[aria-label="New post"] textarea')?.maxLength).toBe(4000);
      box.value = 'The *tide* chapter, yes';
      box.dispatchEvent(new Event('input'));
      page().querySelector<HTMLButtonElement>('form[aria-label="Reply"] button[type="submit"]')!.click();
      await until(() => page().querySelector('.replies .post em') !== null, fixture);
      expect(textOf(page().querySelector('.replies .post .text'))).toBe('The tide chapter, yes');
      const reply = (await journal.db.table('circlePosts').toArray()).find((post) => post.id !== POST);
      expect(reply?.replyToId).toBe(POST);

      // The first post's own button (its reply has one of each reaction too).
      const lamp = () => page().querySelector<HTMLButtonElement>('.post button[aria-label^="This lit something up"]')!;
      lamp().click();
      await until(() => lamp().getAttribute('aria-label') === 'This lit something up, 1', fixture);
      expect(lamp().getAttribute('aria-pressed')).toBe('true');
      lamp().click();
      await until(() => lamp().getAttribute('aria-label') === 'This lit something up, 0', fixture);
      const rows = await journal.db.table('circleReactions').toArray();
      expect(rows.map((row) => [row.postId, row.kind, row.on])).toEqual([[POST, 'lamp', false]]);
    },
    SLOW,
  );
});
