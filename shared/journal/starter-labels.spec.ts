import { deterministicId } from '../sync/deterministic-id';
import { mergeLabels, STARTER_LABELS } from './starter-labels';

describe('starter labels', () => {
  it('come with fixed, name-based ids so every device agrees on them', () => {
    expect(STARTER_LABELS.find((l) => l.name === 'Re-read')?.id).toBe(deterministicId('starter-label', 're-read'));
    expect(new Set(STARTER_LABELS.map((l) => l.id)).size).toBe(STARTER_LABELS.length);
  });

  it('merge with the reader’s changes and own labels; a removed starter stays removed', () => {
    const reRead = STARTER_LABELS[1]!;
    const merged = mergeLabels([
      { id: reRead.id, colour: 'slate' }, // recoloured, name kept
      { id: STARTER_LABELS[0]!.id, deleted: true },
      { id: 'own-2', name: 'Winter', colour: 'sky', icon: 'flag', deleted: false },
      { id: 'own-1', name: 'Book club', colour: 'sand', icon: 'group', deleted: false },
      { id: 'own-3', name: 'Half-made', deleted: false }, // still arriving in pieces: not shown yet
    ]);

    expect(merged.map((l) => l.name)).toEqual([...STARTER_LABELS.slice(1).map((l) => l.name), 'Book club', 'Winter']);
    expect(merged.find((l) => l.id === reRead.id)).toEqual({ ...reRead, colour: 'slate' });
  });
});

describe('the first starter label', () => {
  it('has words of our own and still the id it was made with, so a reader’s rename of it still applies', () => {
    const keeper = STARTER_LABELS[0]!;

    expect(keeper.name).toBe('A keeper');
    expect(keeper.id).toBe(deterministicId('starter-label', 'five-stars'));
    expect(mergeLabels([{ id: keeper.id, name: 'All-time best' }])[0]!.name).toBe('All-time best');
  });
});
