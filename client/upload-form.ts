import { uploadFileName } from '../shared/schemas/upload-file-name';
import { ApiRequestError } from './api-request-error';

/**
 * The multipart body of an upload (the file in the field "file"), after checking its name with the
 * schema the server uses, so a refused name is shown at once in the same words the server would use.
 */
export function uploadForm(file: Blob & { name?: string }, fallbackName: string): FormData {
  const name = file.name ?? fallbackName;
  const checked = uploadFileName.safeParse(name);
  if (!checked.success) {
    const issues = checked.error.issues.map((i) => ({ field: 'file.name', rule: i.message }));
    throw new ApiRequestError(400, {
      kind: 'invalid-input',
      message: `invalid input: ${issues.map((i) => `${i.field} ${i.rule}`).join('; ')}`,
      issues,
    });
  }
  const form = new FormData();
  form.append('file', file, name);
  return form;
}
