import { ownOrigins } from '../../../server/http/own-origins';

describe('ownOrigins', () => {
  it('defaults to the app URL and the loopback names of the served port', () => {
    expect(ownOrigins('https://sheets.example.org/', 8460, undefined)).toEqual([
      'https://sheets.example.org',
      'http://127.0.0.1:8460',
      'http://localhost:8460',
      'http://[::1]:8460',
    ]);
  });

  it('takes a configured list instead, reduced to origins', () => {
    expect(ownOrigins('http://127.0.0.1:8460', 8460, ' https://a.example/path , http://b.example:81 ')).toEqual([
      'https://a.example',
      'http://b.example:81',
    ]);
  });

  it('refuses a configured entry that is not an http(s) URL, naming it', () => {
    expect(() => ownOrigins('http://127.0.0.1:8460', 8460, 'ftp://x.example')).toThrow(/ftp:\/\/x\.example/);
  });
});
