/**
 * The harness as the server and the scripts use it: the only harness module they import (the
 * `harness-surface` rule in eslint.config.js holds that). Everything else under harness/ is
 * internal and may move. The web app has its own, smaller entry: harness/web.ts.
 */
// Targets: discovering the installed libraries, and the interfaces that open and evaluate them.
export { discoverTargets } from './adapters/discover-targets';
export { installedTargets } from './adapters/installed-targets';
export { resolveTargetSource } from './adapters/resolve-target-source';
export { findEntry } from './adapters/find-entry';
export type { Target } from './adapters/target';
export type { TargetDescriptor } from './adapters/target-descriptor';
// Suites: validation and the reference-table check of a suite under review.
export { checkSuite } from './suites/check-suite';
export { checkReferenceTable } from './suites/check-reference-table';
// Subjects, paths, cuts.
export { parseSubject } from './expressions/parse-subject';
export type { SubjectExpr } from './expressions/subject-expr';
export { buildPath } from './paths/build-path';
export type { PathPoint } from './paths/path-point';
export { subjectCuts } from './cuts/subject-cuts';
export { toPathSpec } from './runner/evaluation/to-path-spec';
// Evaluation: one suite × one target (its values; evaluatePair adds the property checks, the time
// limit and the one error result, as the CLI and the server's shard executor run it), the expected
// values, property checks.
export { evaluateSuite } from './runner/evaluation/evaluate-suite';
export { evaluatePair } from './runner/evaluation/evaluate-pair';
export { suiteExpectation } from './runner/expectations/suite-expectation';
export type { ExpectedColumn } from './runner/expectations/expectation';
export { ReferenceCache } from './runner/reference-cache/reference-cache';
export { suiteCacheKey } from './runner/reference-cache/suite-cache-key';
// Plans (the CLI's runs; the server runs shards of its own).
export { buildPlan } from './runner/plan/build-plan';
export { runPlan } from './runner/plan/run-plan';
// Library findings: fingerprint, cut map, version matrix.
export { FINGERPRINT_FUNCTIONS } from './fingerprint/fingerprint-functions';
export { fingerprintTarget } from './fingerprint/fingerprint-target';
export { mapCuts } from './cutmap/map-cuts';
export { libraryVersions } from './matrix/library-versions';
export { versionMatrix } from './matrix/version-matrix';
// The reference engine and comparisons, for the benchmarks.
export { BigComplex } from './reference/complex/big-complex';
export { principalDouble } from './reference/principal-double';
export { principalValue } from './reference/principal-value';
export { answerReference } from './reference/answer-reference';
export { ulpsApart } from './checks/ulps-apart';
export { relativeError } from './checks/relative-error';

// The function catalogue, for the demo-suite generator.
export { CATALOGUE_ENTRIES } from './catalogue/catalogue-entries';
export type { DemoCut, DemoPrincipalFunction } from './catalogue/demo-principal-function';

// The verdict audit (scripts/verdict-audit): a subject's library values and the catalogue's cuts.
export { subjectProgram } from './runner/evaluation/subject-program';
export { evaluateProgram } from './runner/evaluation/evaluate-program';
export { pathInputs } from './runner/evaluation/path-inputs';
export { catalogue } from './reference/catalogue';
export { formatHexDouble } from './checks/format-hex-double';
export { parseDouble } from './reference/numbers/parse-double';
export type { Rational } from './reference/numbers/rational';
export { cacheDir } from './cache-dir';
export { cacheDirFromEnv } from './cache-dir-from-env';
