import { formatHlc } from './hlc';
import { applyPulled, emptyRow, type LocalRow } from './local-row';

const at = (wall: number, node = 'laptop') => formatHlc({ wall, counter: 0, node });

describe('applyPulled', () => {
  it('fills an empty row from pulled pieces', () => {
    const row = applyPulled(emptyRow('r1'), [
      { field: 'title', value: 'Saltmarsh Hours', hlc: at(1) },
      { field: 'rating', value: 4, hlc: at(1) },
    ]);
    expect(row).toEqual({ id: 'r1', title: 'Saltmarsh Hours', rating: 4, _hlc: { title: at(1), rating: at(1) } });
  });

  it('never lets a pulled value overwrite a pending local edit with a later clock', () => {
    const mine: LocalRow = { id: 'r1', title: 'Typed on the plane', _hlc: { title: at(20, 'tablet') } };

    const after = applyPulled(mine, [{ field: 'title', value: 'Older server title', hlc: at(10) }]);

    expect(after).toBe(mine);
  });

  it('takes a later pulled value field by field and leaves the other fields alone', () => {
    const mine: LocalRow = { id: 'r1', title: 'Mine', rating: 2, _hlc: { title: at(20, 'tablet'), rating: at(5, 'tablet') } };

    const after = applyPulled(mine, [
      { field: 'title', value: 'Theirs', hlc: at(10) },
      { field: 'rating', value: 4.5, hlc: at(10) },
    ]);

    expect(after).toEqual({ id: 'r1', title: 'Mine', rating: 4.5, _hlc: { title: at(20, 'tablet'), rating: at(10) } });
    expect(mine['rating']).toBe(2); // the input row is not mutated
  });

  it('is idempotent: applying the same pulled values twice changes nothing more', () => {
    const changes = [{ field: 'status', value: 'finished', hlc: at(3) }];
    const once = applyPulled(emptyRow('r1'), changes);
    expect(applyPulled(once, changes)).toBe(once);
  });
});
