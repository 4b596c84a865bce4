/** A message the local mail server received, as the Outbox screen lists it (`html` and `text` only in the detail). */
export interface ReceivedMailView {
  id: string;
  from: string;
  to: string[];
  subject: string;
  receivedAt: string;
  text?: string;
  html?: string | null;
}
