import { LINK_TOKEN_PATTERN } from '../../shared/schemas/link-token-schema';

/**
 * The SET items that take one-time link tokens out of an outbox row's bodies. A link's token is
 * stored nowhere but in its mail (account_links keeps its hash); once the outbox is done with a
 * mail (sent, failed or unconfirmed), its copy keeps the words and loses the token, so a reader
 * of the database cannot open an account with it. While a mail waits (seconds, or the relay's
 * backoff) its row must hold the token to send it.
 */
export const SCRUB_LINK_TOKENS_SQL = `text_body = regexp_replace(text_body, '${LINK_TOKEN_PATTERN}', '[link removed after sending]', 'g'),
       html_body = regexp_replace(html_body, '${LINK_TOKEN_PATTERN}', '[link removed after sending]', 'g')`;
