import { STORABLE_TEXT_RULE } from '../../../shared/schemas/text-schema';
import { EXPIRY_DAY_RULE, expiryDaySchema } from '../../../shared/schemas/expiry-day-schema';

const rules = (value: unknown) => {
  const r = expiryDaySchema.safeParse(value);
  return r.success ? [] : r.error.issues.map((i) => i.message);
};

describe('expiryDaySchema', () => {
  it('reads a day as midnight UTC at its start, and a date and time with an offset as it is', () => {
    expect(expiryDaySchema.parse('2099-01-31')).toBe('2099-01-31T00:00:00Z');
    expect(expiryDaySchema.parse(' 2099-01-31 ')).toBe('2099-01-31T00:00:00Z');
    expect(expiryDaySchema.parse('2099-01-31T12:00:00+02:00')).toBe('2099-01-31T12:00:00+02:00');
  });

  it('answers anything that is not a day of the calendar in the words of the field', () => {
    for (const typed of ['31/01/2099', '2099-1-31', '2099-02-30', '2099-13-01', 'next spring', '', '2099-01-31T00:00'])
      expect({ typed, rules: rules(typed) }).toEqual({ typed, rules: [EXPIRY_DAY_RULE] });
    expect(rules(20990131)).toEqual([EXPIRY_DAY_RULE]);
    expect(rules('2099-01-31\u0000')).toEqual([STORABLE_TEXT_RULE]);
  });

  it('refuses today and earlier days: the decision would have expired already', () => {
    const today = new Date().toISOString().slice(0, 10);
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    expect(rules(today)).toEqual(['must be a day after today (UTC)']);
    expect(rules('2001-01-01')).toEqual(['must be a day after today (UTC)']);
    expect(rules(tomorrow)).toEqual([]);
  });
});
