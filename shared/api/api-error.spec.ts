import { isApiErrorBody } from './api-error';

describe('isApiErrorBody', () => {
  it('accepts the error shape every API route answers with', () => {
    expect(isApiErrorBody({ error: { code: 'not_found', message: 'No route', details: null } })).toBeTrue();
    expect(isApiErrorBody({ error: { code: 'invalid', message: 'Bad', details: { title: 'is required' } } })).toBeTrue();
  });

  it('rejects bodies that only look similar', () => {
    expect(isApiErrorBody(null)).toBeFalse();
    expect(isApiErrorBody('<html>Bad gateway</html>')).toBeFalse();
    expect(isApiErrorBody({ error: 'boom' })).toBeFalse();
    expect(isApiErrorBody({ error: { code: 500, message: 'x' } })).toBeFalse();
  });
});
