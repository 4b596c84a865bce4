import type { ClassifyBody } from './schemas/classify-body';

/**
 * The decision in force that covers a row of the failure table (an accepted deviation before a
 * bug or convention verdict, then the newest), as a page of GET /api/failures gives it by failure
 * number in `decisions`; the row shows it as a marker that links to it.
 */
export interface DecisionMark {
  id: string;
  classification: ClassifyBody['classification'];
  expiresAt: string | null;
}
