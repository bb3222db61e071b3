import { CIRCLE_COLLECTION_NAMES } from './circle-collection-names';
import { CIRCLE_COLLECTIONS } from './circle-collections';
import { writeRefusal, type WriteContext } from './circle-permissions';

const circleId = '11111111-1111-4111-8111-111111111111';
const member: WriteContext = { circleId, role: 'member', callerId: 'm', authorId: undefined };
const change = (collection: string, field: string, value: unknown = 'x', rowId = '22222222-2222-4222-8222-222222222222') => ({ collection, rowId, field, value });

describe('who may write what in a circle', () => {
  it('keeps the circle and its schedule for hosts', () => {
    expect(writeRefusal(change('circleParts', 'date'), member)?.code).toBe('not_allowed');
    expect(writeRefusal(change('circleParts', 'date'), { ...member, role: 'host' })).toBeNull();
    expect(writeRefusal(change('circles', 'name', 'x', circleId), { ...member, role: 'host' })).toBeNull();
  });

  it('refuses rows that name another circle', () => {
    expect(writeRefusal(change('circlePosts', 'circleId', '33333333-3333-4333-8333-333333333333'), member)?.code).toBe('wrong_circle');
    expect(writeRefusal(change('circles', 'name'), { ...member, role: 'host' })?.code).toBe('wrong_circle');
  });

  it('lets only the author edit a post and only a host hide it', () => {
    expect(writeRefusal(change('circlePosts', 'text'), member)).toBeNull();
    expect(writeRefusal(change('circlePosts', 'text'), { ...member, authorId: 'm' })).toBeNull();
    expect(writeRefusal(change('circlePosts', 'text'), { ...member, authorId: 'someone' })?.reason).toContain('author');
    expect(writeRefusal(change('circlePosts', 'text'), { ...member, role: 'host', authorId: 'someone' })?.code).toBe('not_allowed');
    expect(writeRefusal(change('circlePosts', 'hidden', true), { ...member, role: 'host', authorId: 'someone' })).toBeNull();
    expect(writeRefusal(change('circlePosts', 'hidden', true), { ...member, authorId: 'm' })?.code).toBe('not_allowed');
  });

  it('keeps RSVPs, reactions and progress with their author', () => {
    expect(writeRefusal(change('circleRsvps', 'answer', 'going'), { ...member, authorId: 'other' })?.code).toBe('not_allowed');
    expect(writeRefusal(change('circleProgress', 'shareProgress', true), { ...member, authorId: 'm' })).toBeNull();
    expect(writeRefusal(change('books', 'title'), member)?.code).toBe('not_allowed');
  });

  it('knows every circle collection by the names the device database declares', () => {
    expect(Object.keys(CIRCLE_COLLECTIONS)).toEqual([...CIRCLE_COLLECTION_NAMES]);
  });
});
