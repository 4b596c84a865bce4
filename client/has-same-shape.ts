/**
 * Whether `value` (read back from storage) has the shape of `template`: the same keys with
 * values of the same kind, all the way down through objects. Arrays only need to be arrays,
 * since their items may be more or fewer than the template's. A null on either side matches an
 * object or a null, because optional parts of a form are null until switched on.
 */
export function hasSameShape(template: unknown, value: unknown): boolean {
  if (template === null || value === null)
    return (
      (template === null || typeof template === 'object') &&
      (value === null || typeof value === 'object') &&
      !Array.isArray(template) &&
      !Array.isArray(value)
    );
  if (Array.isArray(template)) return Array.isArray(value);
  if (typeof template !== 'object') return typeof value === typeof template;
  if (typeof value !== 'object' || Array.isArray(value)) return false;
  const v = value as Record<string, unknown>;
  return Object.entries(template as Record<string, unknown>).every(([key, t]) => key in v && hasSameShape(t, v[key]));
}
