import { mergePulledRow, type LocalCircleRow } from './circle-rows';

const clock = (wall: number, node: string) => `${String(wall).padStart(15, '0')}:00000:${node}`;

describe('mergePulledRow', () => {
  it('takes pulled fields with greater clocks and keeps the device’s later writes (per field, last writer wins)', () => {
    const local: LocalCircleRow = { id: 'p', text: 'written offline', hidden: false, _hlc: { text: clock(20, 'me'), hidden: clock(5, 'me') } };

    const merged = mergePulledRow(local, {
      collection: 'circlePosts',
      id: 'p',
      authorId: 'u1',
      fields: { text: { value: 'older text', hlc: clock(10, 'other') }, hidden: { value: true, hlc: clock(12, 'host') } },
    });

    expect(merged['text']).toBe('written offline');
    expect(merged['hidden']).toBeTrue();
    expect(merged._hlc).toEqual({ text: clock(20, 'me'), hidden: clock(12, 'host') });
    expect(merged._author).toBe('u1');
  });

  it('creates a row that was not on the device', () => {
    const merged = mergePulledRow(undefined, { collection: 'circlePosts', id: 'n', authorId: 'u2', fields: { text: { value: 'hello', hlc: clock(1, 'x') } } });
    expect(merged).toEqual({ id: 'n', text: 'hello', _hlc: { text: clock(1, 'x') }, _author: 'u2' });
  });
});
