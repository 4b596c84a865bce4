import { useMutation } from '@tanstack/react-query';
import type { ReferenceTableCheck } from '../shared/reference-table-check';
import { apiFetch } from './api-fetch';
import { uploadForm } from './upload-form';

/** Uploads a CSV of reference values computed elsewhere; the answer lists where they disagree with Sheetkeeper's reference. */
export function useUploadReferenceTable(slug: string) {
  return useMutation({
    mutationFn: async (file: Blob & { name?: string }) => {
      const form = uploadForm(file, 'reference.csv');
      return apiFetch<{ suite: string; version: number; check: ReferenceTableCheck }>(
        `/suites/${encodeURIComponent(slug)}/reference-table`,
        { method: 'POST', body: form },
      );
    },
  });
}
