import type { AccountLinkKind } from '../../shared/account-link-kinds';
import { roleWithArticle } from '../../shared/role-with-article';
import type { Role } from '../../shared/roles';
import { escapeHtml } from './escape-html';
import type { NewMail } from './new-mail';

export interface AccountLinkMailInput {
  kind: AccountLinkKind;
  to: string;
  /** The admin who sent it, as "Name (address)": the person knows whom to ask. */
  sentBy: string;
  role: Role;
  /** The one-time link itself, token included. */
  link: string;
  expiresAt: Date;
}

/** The date and minute a link stops working, in UTC, which every reader can place. */
const whenUtc = (d: Date) => `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

/** The mail that carries an invitation or a password-reset link: plain words, the link, until when it works. */
export function accountLinkMail(input: AccountLinkMailInput): NewMail {
  const invitation = input.kind === 'invitation';
  const subject = invitation ? `${input.sentBy} invites you to Sheetkeeper` : 'Choose a new Sheetkeeper password';
  const lead = invitation
    ? `${input.sentBy} invites you to Sheetkeeper as ${roleWithArticle(input.role)}. Open this link to choose your name and password:`
    : `${input.sentBy} started a password reset for your Sheetkeeper account. Open this link to choose a new password:`;
  const after = invitation
    ? 'The link works once.'
    : 'The link works once; using it signs you out everywhere else. Your old password works until then.';
  const until = `It works until ${whenUtc(input.expiresAt)}. If it has expired, ask ${input.sentBy} for a new one.`;
  const text = [lead, '', input.link, '', `${after} ${until}`, ''].join('\n');
  const html = `<!doctype html><html><body style="font-family: sans-serif">
<p>${escapeHtml(lead)}</p>
<p><a href="${escapeHtml(input.link)}">${escapeHtml(input.link)}</a></p>
<p>${escapeHtml(after)} ${escapeHtml(until)}</p>
</body></html>`;
  return { kind: input.kind, recipients: [input.to], subject, text, html };
}
