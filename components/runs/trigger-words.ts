import type { RunTrigger } from '../../shared/run-status';

/** What started a run, and who, in words: "scheduled", "by Kwame Asante", "via API by …". */
export function triggerWords(trigger: RunTrigger, requestedBy: string | null): string {
  switch (trigger) {
    case 'schedule':
      return 'scheduled';
    case 'api':
      return requestedBy ? `via API by ${requestedBy}` : 'via API';
    case 'manual':
      return requestedBy ? `by ${requestedBy}` : 'by hand';
  }
}
