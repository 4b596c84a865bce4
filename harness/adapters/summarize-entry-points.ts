import type { EntryPointFinding } from './entry-point-finding';

/** One way into one library, over all probe inputs. */
interface WaySummary {
  target: string;
  way: string;
  /** Every input arrived with its value and zero signs. */
  intact: boolean;
  /** The inputs that did not, as "re im → re im" (or "re im → error: …"). */
  lost: string[];
}

/**
 * Folds entry-point findings into one line per target and way, in the order the
 * findings came, so a report can say at a glance which ways keep −0.
 */
export function summarizeEntryPoints(findings: readonly EntryPointFinding[]): WaySummary[] {
  const byWay = new Map<string, WaySummary>();
  for (const f of findings) {
    const key = `${f.target}\u0000${f.way}`;
    const summary = byWay.get(key) ?? { target: f.target, way: f.way, intact: true, lost: [] };
    byWay.set(key, summary);
    if (f.intact) continue;
    summary.intact = false;
    summary.lost.push(`${f.input.join(' ')} → ${f.arrived ? f.arrived.join(' ') : `error: ${f.error ?? 'unknown'}`}`);
  }
  return [...byWay.values()];
}
