/**
 * The rules broken at a field of the suite body (dotted path, as the schema and the server
 * name it). `within` also takes rules on anything under the field (list items of "along").
 */
export type FieldRules = (field: string, mode?: 'exact' | 'within') => string[];
