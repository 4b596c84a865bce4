import { ApiRequestError } from '../../client/api-request-error';
import { refusalMessage } from '../../client/refusal-message';

describe('refusalMessage', () => {
  it("gives the API's own words when it refused", () => {
    const refused = new ApiRequestError(403, { kind: 'forbidden', message: 'Only admins may do that.' } as never);
    expect(refusalMessage(refused, 'The server could not be reached.')).toBe('Only admins may do that.');
  });

  it('gives the unreachable words when the request got no answer', () => {
    expect(refusalMessage(new TypeError('Failed to fetch'), 'The server could not be reached.')).toBe(
      'The server could not be reached.',
    );
  });

  it('gives nothing when nothing went wrong', () => {
    expect(refusalMessage(null, 'The server could not be reached.')).toBeNull();
  });
});
