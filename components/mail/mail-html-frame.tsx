import { SkText } from '../ui/sk-text';

/**
 * Outside the web there is no sandboxed frame to put a stranger's HTML in, and no HTML renderer is
 * installed, so native builds say so and the plain-text part is the way to read the message.
 */
export function MailHtmlFrame(_props: { html: string; title: string }) {
  return (
    <SkText variant="caption">
      The HTML part is shown in the web app only; switch to the plain text to read this message here.
    </SkText>
  );
}
