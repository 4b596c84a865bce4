import { ApiRequestError } from '../../client/api-request-error';
import { uploadForm } from '../../client/upload-form';

const file = (name?: string) => Object.assign(new Blob(['{}'], { type: 'application/json' }), name ? { name } : {});

describe('uploadForm', () => {
  it('puts the file in the field "file" under its own name, or the fallback when it has none', () => {
    expect((uploadForm(file('sqrt.json'), 'suite.json').get('file') as File).name).toBe('sqrt.json');
    expect((uploadForm(file(), 'suite.json').get('file') as File).name).toBe('suite.json');
  });

  it('refuses a name the server would refuse, with the same field and rule, before anything is sent', () => {
    let thrown: unknown;
    try {
      uploadForm(file(`${'a'.repeat(250)}.json`), 'suite.json');
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(ApiRequestError);
    expect((thrown as ApiRequestError).status).toBe(400);
    expect((thrown as ApiRequestError).body).toMatchObject({
      kind: 'invalid-input',
      issues: [{ field: 'file.name', rule: 'must be at most 200 characters' }],
    });
  });
});
