import { signInBody } from '../../../shared/schemas/sign-in-body';

describe('signInBody', () => {
  it('lower-cases and trims the e-mail', () => {
    expect(signInBody.parse({ email: '  Odile@Example.TEST ', password: 'x' })).toEqual({
      email: 'odile@example.test',
      password: 'x',
    });
  });

  it('names unknown fields', () => {
    const result = signInBody.safeParse({ email: 'a@b.io', password: 'x', admin: true });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toBe('has unknown fields: admin');
  });

  it('refuses a body that is not an object', () => {
    const result = signInBody.safeParse('email=a@b.io');
    expect(result.error?.issues[0]?.message).toBe('must be a JSON object');
  });
});
