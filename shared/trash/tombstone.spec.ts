import { formatHlc } from '../sync/hlc';
import { deletedAtMs, deletedWith, editedAfterDelete, inTrash, purgeCutoffClock } from './tombstone';

// Instants are written in ISO 8601 and read with ECMAScript's Date.parse (ECMA-262 §21.4.3.2), a
// reference outside the project; a day is 86,400,000 ms (ECMA-262 §21.4.1.3, msPerDay).
const at = (iso: string, node = 'tablet', counter = 0) => formatHlc({ wall: Date.parse(iso), counter, node });

describe('tombstone rules', () => {
  const deletedOn = at('2026-11-01T09:30:00Z', 'laptop');

  it('reads when a row was deleted from the wall time of its delete clock', () => {
    expect(deletedAtMs({ deleted: true, _hlc: { deleted: deletedOn } })).toBe(Date.UTC(2026, 10, 1, 9, 30));
    expect(deletedAtMs({ deleted: false, _hlc: { deleted: deletedOn } })).toBeNull();
  });

  it('flags a row written after its delete by a device that had not seen it', () => {
    const row = { deleted: true, _hlc: { deleted: deletedOn, title: at('2026-11-01T09:31:00Z') } };
    expect(editedAfterDelete(row)).toBeTrue();
  });

  it('does not flag edits made before the delete, nor a row that is not deleted', () => {
    expect(editedAfterDelete({ deleted: true, _hlc: { deleted: deletedOn, title: at('2026-11-01T09:29:59Z') } })).toBeFalse();
    expect(editedAfterDelete({ deleted: false, _hlc: { deleted: deletedOn, title: at('2026-11-02T00:00:00Z') } })).toBeFalse();
  });

  it('breaks a tie of wall time by counter, as clocks compare', () => {
    const edit = at('2026-11-01T09:30:00Z', 'laptop', 1);
    expect(editedAfterDelete({ deleted: true, _hlc: { deleted: deletedOn, note: edit } })).toBeTrue();
  });

  it('keeps a row in Trash for 30 days after its delete, not a millisecond more', () => {
    const row = { deleted: true, _hlc: { deleted: deletedOn } };
    expect(inTrash(row, Date.parse('2026-12-01T09:30:00Z'))).toBeTrue();
    expect(inTrash(row, Date.parse('2026-12-01T09:30:00.001Z'))).toBeFalse();
    expect(inTrash({ deleted: false, _hlc: {} }, Date.parse('2026-11-02T00:00:00Z'))).toBeFalse();
  });

  it('puts the purge cutoff exactly 30 days back in clock order', () => {
    const cutoff = purgeCutoffClock(Date.parse('2026-12-01T09:30:00Z'));
    expect(at('2026-11-01T09:29:59.999Z', 'zzz', 99_999) < cutoff).toBeTrue();
    expect(at('2026-11-01T09:30:00Z', '0', 0) < cutoff).toBeFalse();
  });

  it('tells rows deleted in one write by their shared clock', () => {
    expect(deletedWith({ deleted: true, _hlc: { deleted: deletedOn } }, deletedOn)).toBeTrue();
    expect(deletedWith({ deleted: true, _hlc: { deleted: at('2026-10-01T00:00:00Z') } }, deletedOn)).toBeFalse();
  });
});
