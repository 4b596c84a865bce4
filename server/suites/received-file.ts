import { STORABLE_TEXT_RULE, textSchema } from '../../shared/schemas/text-schema';
import { InputError } from '../http/input-error';

const storable = textSchema();

/**
 * An uploaded file's name and its text (UTF-8), both held to the text rule of every other input:
 * a NUL in a reference table's `source` cell reached the `uploads.summary` jsonb column and
 * answered 500. A file is read as UTF-8, which turns broken bytes into U+FFFD, so what remains to
 * refuse is U+0000; the rule names the first line that has one.
 */
export function receivedFile(file: Express.Multer.File): { name: string; text: string } {
  if (!storable.safeParse(file.originalname).success)
    throw new InputError([{ field: 'file.name', rule: STORABLE_TEXT_RULE }]);
  const text = file.buffer.toString('utf8');
  if (!storable.safeParse(text).success) {
    const line = text.split('\n').findIndex((l) => !storable.safeParse(l).success) + 1;
    throw new InputError([{ field: 'file', rule: `line ${line} ${STORABLE_TEXT_RULE}` }]);
  }
  return { name: file.originalname, text };
}
