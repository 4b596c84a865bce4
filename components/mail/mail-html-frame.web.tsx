import { theme } from '../../constants/theme';

/**
 * A received message's HTML in a frame with every sandbox restriction on (`sandbox=""`): the
 * document gets an opaque origin, so no script runs, no form posts, no link navigates the app,
 * and it cannot read the app's cookies or storage. A `srcdoc` document inherits the app's CSP,
 * which also keeps it from fetching images or styles from elsewhere.
 */
export function MailHtmlFrame({ html, title }: { html: string; title: string }) {
  return (
    <iframe
      sandbox=""
      srcDoc={html}
      title={title}
      referrerPolicy="no-referrer"
      data-testid="mail-html-frame"
      style={{
        width: '100%',
        height: '70vh',
        minHeight: 360,
        border: `1px solid ${theme.color.rule}`,
        borderRadius: 6,
        backgroundColor: theme.color.mailGround,
      }}
    />
  );
}
