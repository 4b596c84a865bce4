import { useQuery } from '@tanstack/react-query';
import type { ComputedAnswer } from '../shared/computed-answer';
import type { CutMap } from '../shared/cut-map';
import { apiFetch } from './api-fetch';
import { TARGETS_KEY } from './use-targets';
import { targetPath } from './target-path';

/** What a cut map is asked for, as typed: the box "re0,im0,re1,im1" and the grid "COLUMNSxROWS". */
export interface CutMapAsk {
  fn: string;
  box: string;
  grid: string;
}

/** The cut map of one function of a target over a box; depends only on the installed version and the request. */
export function useCutMap(name: string, ask: CutMapAsk | null) {
  return useQuery({
    queryKey: [...TARGETS_KEY, name, 'cut-map', ask],
    queryFn: () =>
      apiFetch<{ cutMap: CutMap } & ComputedAnswer>(
        `${targetPath(name, 'cut-map')}?${new URLSearchParams({ ...ask! }).toString()}`,
      ),
    staleTime: Infinity,
    enabled: name.length > 0 && ask !== null,
    // Keep the last picture on screen while another box is computed.
    placeholderData: (previous) => previous,
  });
}
