import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SuiteVersionView } from '../shared/suite-version-view';
import { apiFetch } from './api-fetch';
import { uploadForm } from './upload-form';
import { SUITES_KEY } from './use-suites';

/** Uploads a suite file (JSON) as multipart field "file"; the server creates or updates the draft. */
export function useUploadSuite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (file: Blob & { name?: string }) => {
      const form = uploadForm(file, 'suite.json');
      return (await apiFetch<{ version: SuiteVersionView }>('/suites/upload', { method: 'POST', body: form })).version;
    },
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: SUITES_KEY }),
  });
}
