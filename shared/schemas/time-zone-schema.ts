import { textSchema } from './text-schema';

/** An IANA time zone name ("Europe/Oslo", "UTC") that this runtime's Intl knows. */
export const timeZoneSchema = textSchema('is required')
  .max(64, { error: 'must be at most 64 characters' })
  .refine(
    (tz) => {
      try {
        new Intl.DateTimeFormat('en', { timeZone: tz });
        return true;
      } catch {
        return false;
      }
    },
    { error: 'must be a time zone name such as Europe/Oslo or UTC' },
  );
