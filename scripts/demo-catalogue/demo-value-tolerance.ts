import type { Tolerance } from '../../shared/schemas/tolerance-schema';

/**
 * The value tolerance of every principal-branch demo suite: 4 ulps per part, or a normwise
 * relative error of 4 eps (4 · 2^−52 ≈ 8.9e−16), whichever the value meets (docs/suite-format.md
 * "Tolerances").
 *
 * - 4 ulps per part: what test suites of libm implementations allow complex double functions
 *   part by part — glibc's recorded maximum errors (libm-test-ulps) are 1 to 3 ulps per part for
 *   most complex functions (from memory; pow and the cases that cancel are larger), so 4 is
 *   common practice with a margin.
 * - 4 eps normwise: a part that cancels (asech(1000001 + 1e−9i) has real part 1e−21 beside
 *   |value| ≈ 1.57) cannot be held to ulps of itself by a library that computes the value with
 *   ordinary complex arithmetic; the normwise error is what such arithmetic bounds — complex
 *   multiplication alone is within √5·2^−53 ≈ 1.1 eps (Brent, Percival and Zimmermann, Math.
 *   Comp. 76 (2007)) and a formula of a few such steps within a few eps. In the demo run against
 *   complex.js 2.4.3 at 4 ulps alone, 730 of the 1,073 failures were within 4 eps normwise with
 *   the right zero signs (`node --import tsx scripts/findings-figures.ts RUN.json`): noise a
 *   maintainer of a double-precision library would not act on, burying 257 branch findings.
 *   With this bound, 363 failures: the 257 branch findings, and 106 accuracy findings of which
 *   the 20 within 4 eps each have a tiny part of the opposite sign.
 *
 * A zero of the wrong sign, a value on the other side of a cut or on another sheet fails whatever
 * its size: the tolerance holds right-branch values only.
 */
export const DEMO_VALUE_TOLERANCE: Tolerance = { ulps: 4, relative: 4 * Number.EPSILON };
