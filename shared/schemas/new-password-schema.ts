import { PASSWORD_MAX_LENGTH } from '../password-max-length';
import { PASSWORD_MIN_LENGTH } from '../password-min-length';
import { textSchema } from './text-schema';

/** A password someone chooses (after an invitation or a reset); sign-in takes any it may have set. */
export const newPasswordSchema = textSchema('is required')
  .min(PASSWORD_MIN_LENGTH, { error: `must be at least ${PASSWORD_MIN_LENGTH} characters` })
  .max(PASSWORD_MAX_LENGTH, { error: `must be at most ${PASSWORD_MAX_LENGTH} characters` });
