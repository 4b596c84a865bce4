/** The error text of a strict object: unknown fields are named, anything else is "must be a JSON object". */
export function objectError(issue: { code: string; keys?: string[] }): string {
  return issue.code === 'unrecognized_keys'
    ? `has unknown fields: ${(issue.keys ?? []).join(', ')}`
    : 'must be a JSON object';
}
