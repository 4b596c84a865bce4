import { z } from 'zod';

const fieldIssue = z
  .object({
    field: z.string().meta({ description: 'The dotted path of the field: `body.name`, `params.id`, `query.limit`.' }),
    rule: z.string().meta({ description: 'What the rule says, in words.' }),
  })
  .meta({ description: 'One broken rule of an input: the dotted field path and what the rule says.' });

/** An error body whose only fields are its kind and message. */
function plain<Kind extends string>(kind: Kind, description: string) {
  return z.object({ kind: z.literal(kind), message: z.string() }).meta({ description });
}

/**
 * Every error body the API sends, declared once: the app reads its type (`ApiError`), the
 * OpenAPI document shows it as JSON Schema. `kind` tells the app how to show it; `issues` is
 * present for `invalid-input` only.
 */
export const apiErrorSchema = z
  .discriminatedUnion('kind', [
    z
      .object({ kind: z.literal('invalid-input'), message: z.string(), issues: z.array(fieldIssue) })
      .meta({ description: '400: the input breaks a rule; `issues` names each field and its rule.' }),
    plain('signed-out', '401: not signed in, or the API token is unknown or revoked.'),
    plain('forbidden', '403: the role does not allow it, or the request came from a page of another origin.'),
    plain('not-found', '404: no such route or record.'),
    plain('wrong-credentials', '401: the e-mail and password do not match an account.'),
    plain(
      'deactivated',
      '403: the account is deactivated (said only to someone who gave its password, or who holds a link to it); an admin can reactivate it.',
    ),
    plain(
      'link-unusable',
      '410: the one-time link is unknown, expired, used or replaced by a newer one; the message says which and whom to ask.',
    ),
    z
      .object({ kind: z.literal('too-many-attempts'), message: z.string(), retryAfterSeconds: z.number() })
      .meta({ description: '429: too many failed sign-ins; try again after `retryAfterSeconds`.' }),
    plain('conflict', '409: the record is not in a state that allows it.'),
    plain('payload-too-large', '413: the body or file is too large.'),
    plain('unsupported-media-type', '415: the body or file is of a type the route does not take.'),
    plain(
      'unavailable',
      '503: the server could not answer now (the database is unreachable, or a library computation stopped after its time limit): try again or ask for less.',
    ),
    z.object({ kind: z.literal('over-time-budget'), message: z.string(), budgetSeconds: z.number() }).meta({
      description:
        '422: the work asked for passed its time budget and was stopped; the message says what was checked and how to ask for less.',
    }),
    plain('server-error', '500: something went wrong on the server; the log has the details.'),
  ])
  .meta({ description: 'Every error body the API sends; `kind` says which.' });
