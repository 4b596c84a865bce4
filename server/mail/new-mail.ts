/** A mail to send: plain-text and HTML parts of the same content. */
export interface NewMail {
  kind: string;
  recipients: string[];
  subject: string;
  text: string;
  html: string;
}
