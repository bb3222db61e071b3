import { handOverRefusal, leaveRefusal, removeRefusal, type Membership } from './circle-roles';

const host: Membership = { userId: 'h', role: 'host' };
const member: Membership = { userId: 'm', role: 'member' };
const other: Membership = { userId: 'o', role: 'member' };

describe('circle roles', () => {
  it('lets a host remove a member but not a member remove anyone', () => {
    expect(removeRefusal(host, 'm', [host, member])).toBeNull();
    expect(removeRefusal(member, 'o', [host, member, other])).toBe('Only a host can remove members');
    expect(removeRefusal(host, 'h', [host, member])).toContain('Leave');
    expect(removeRefusal(host, 'nobody', [host, member])).toContain('not in the circle');
  });

  it('hands over hosting only from a host to someone in the circle', () => {
    expect(handOverRefusal(host, 'm', [host, member])).toBeNull();
    expect(handOverRefusal(member, 'h', [host, member])).toContain('Only a host');
    expect(handOverRefusal(host, 'x', [host, member])).toContain('not in the circle');
  });

  it('keeps the last host until they hand over, unless they are alone', () => {
    expect(leaveRefusal(member, [host, member])).toBeNull();
    expect(leaveRefusal(host, [host, member])).toContain('Hand over');
    expect(leaveRefusal(host, [host])).toBeNull();
    expect(leaveRefusal(host, [host, { userId: 'h2', role: 'host' }, member])).toBeNull();
    expect(leaveRefusal(undefined, [host])).toContain('not in this circle');
  });
});
