import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { SuiteIssue } from '../../../shared/suite-issue';
import { validateSuite } from '../../../shared/validate-suite';
import { checkSuiteSemantics } from '../../suites/check-suite-semantics';

export type SuiteLoad = { ok: true; suites: Suite[] } | { ok: false; issues: SuiteIssue[] };

/** Every .json file under a folder, sorted, recursively. */
function jsonFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true })
    .flatMap((e) =>
      e.isDirectory() ? jsonFiles(path.join(dir, e.name)) : e.name.endsWith('.json') ? [path.join(dir, e.name)] : [],
    )
    .sort();
}

/**
 * The suites `--suite` names: a suite file, a folder of suite files, or a suite id looked up
 * among the files under `suitesDir` (the project's suites/). Each is validated with the shared
 * schema and then beyond it (subject whitelist, cut layout); every problem is returned in the
 * shared issue form, naming the suite (or file), the field and the rule, for exit code 2.
 */
export function loadSuites(names: string[], suitesDir: string): SuiteLoad {
  const issues: SuiteIssue[] = [];
  const suites: Suite[] = [];
  let index: Map<string, string> | null = null;
  const byId = (id: string): string | undefined => {
    if (!index) {
      index = new Map();
      if (existsSync(suitesDir)) {
        for (const file of jsonFiles(suitesDir)) {
          try {
            const data = JSON.parse(readFileSync(file, 'utf8')) as { id?: unknown };
            if (typeof data.id === 'string' && !index.has(data.id)) index.set(data.id, file);
          } catch {
            // A broken file is reported when it is named, not while looking for another.
          }
        }
      }
    }
    return index.get(id);
  };
  const loadFile = (file: string) => {
    const name = path.basename(file);
    let data: unknown;
    try {
      data = JSON.parse(readFileSync(file, 'utf8'));
    } catch (e) {
      issues.push({
        suite: name,
        field: '(file)',
        rule: `is not readable JSON: ${e instanceof Error ? e.message : String(e)}`,
      });
      return;
    }
    const checked = validateSuite(data, name);
    if (!checked.ok) {
      issues.push(...checked.issues);
      return;
    }
    const semantic = checkSuiteSemantics(checked.suite);
    if (semantic.length > 0) {
      issues.push(...semantic);
      return;
    }
    suites.push(checked.suite);
  };
  for (const name of names) {
    if (existsSync(name) && statSync(name).isDirectory()) {
      const files = jsonFiles(name);
      if (files.length === 0) issues.push({ suite: name, field: '(folder)', rule: 'holds no .json suite files' });
      files.forEach(loadFile);
    } else if (existsSync(name)) {
      loadFile(name);
    } else {
      const file = byId(name);
      if (file) loadFile(file);
      else
        issues.push({
          suite: name,
          field: '(suite)',
          rule: `is neither a file nor the id of a suite under ${path.relative(process.cwd(), suitesDir) || suitesDir}`,
        });
    }
  }
  const seen = new Set<string>();
  for (const s of suites) {
    if (seen.has(s.id)) issues.push({ suite: s.id, field: 'id', rule: 'is named twice in this run' });
    seen.add(s.id);
  }
  return issues.length > 0 ? { ok: false, issues } : { ok: true, suites };
}
