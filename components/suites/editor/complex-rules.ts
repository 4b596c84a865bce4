import type { FieldRules } from './field-rules';

/** The rules of a complex field: on the pair, and on each part. */
export function complexRules(rules: FieldRules, field: string) {
  return { whole: rules(field), re: rules(`${field}.re`), im: rules(`${field}.im`) };
}
