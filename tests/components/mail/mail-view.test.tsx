import { act, fireEvent, render, screen } from '@testing-library/react';
import { MailView } from '../../../components/mail/mail-view';
import type { ReceivedMailView } from '../../../shared/received-mail-view';

const message: ReceivedMailView = {
  id: '3c2b1a09-8f7e-4d6c-9b5a-4e3d2c1b0a98',
  from: 'sheetkeeper@localhost',
  to: ['kwame@sheetkeeper.test'],
  subject: 'Regressions in complex.js nightly',
  receivedAt: '2026-03-01T10:00:00.000Z',
  text: 'asin at 1.5+0i: cut-side',
  html: '<h1>Two points regressed</h1><script>document.body.innerHTML = "ran"</script>',
};

describe('MailView', () => {
  it('renders the HTML part in a frame with every sandbox restriction on', () => {
    render(<MailView message={message} />);
    const frame = screen.getByTestId('mail-html-frame');
    expect(frame.tagName).toBe('IFRAME');
    expect(frame.getAttribute('sandbox')).toBe('');
    expect(frame.getAttribute('srcdoc')).toBe(message.html);
    expect(screen.getByRole('tab', { name: 'Rendered HTML' }).getAttribute('aria-selected')).toBe('true');
  });

  it('switches to the plain-text part, and the frame goes', async () => {
    render(<MailView message={message} />);
    await act(() => fireEvent.click(screen.getByRole('tab', { name: 'Plain text' })));
    expect(screen.getByTestId('mail-text').textContent).toBe('asin at 1.5+0i: cut-side');
    expect(screen.queryByTestId('mail-html-frame')).toBeNull();
    expect(screen.getByRole('tab', { name: 'Plain text' }).getAttribute('aria-selected')).toBe('true');
  });

  it('opens on the plain text when the message has no HTML part', () => {
    render(<MailView message={{ ...message, html: null }} />);
    expect(screen.getByTestId('mail-text')).toBeTruthy();
    expect(screen.getByRole('tab', { name: 'Rendered HTML' }).getAttribute('aria-disabled')).toBe('true');
  });
});
