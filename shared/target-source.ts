import { z } from 'zod';
import { textSchema } from './schemas/text-schema';

/**
 * Where a target comes from when it is not one of the libraries installed with Sheetkeeper
 * itself (docs/target-sources.md): a project's `sheetkeeper.config.json`, the CLI's flags, or an
 * admin on the Libraries screen (stored in PostgreSQL). One schema, used by the CLI, the server's
 * routes and the app's form.
 *
 * - `npm`: a package at an exact version, installed on demand from the npm registry into a cache
 *   folder (never into the project's own node_modules); the package must be one the harness has an
 *   adapter for (complex.js, mathjs).
 * - `local`: a JavaScript library's working copy, as a folder with a package.json or a packed
 *   `.tgz`; the package.json's name picks the adapter, its version names the target.
 * - `program`: a command that speaks the stdio protocol (docs/stdio-protocol.md), in any language;
 *   the library, version and entries come from its `describe` answer.
 *
 * `name`, when given, replaces the target's derived name (`complex.js@2.4.3`), so two working copies
 * of one version can be told apart.
 */

/**
 * Printable text without NUL or other control characters. Built on textSchema, whose check also
 * refuses a lone UTF-16 surrogate: JSON carries `"\ud800"` and zod's own string check takes it, but
 * PostgreSQL's jsonb does not, so a source holding one answered 500 on the Libraries screen's route.
 */
const plain = (max: number) =>
  textSchema()
    .min(1, 'must not be empty')
    .max(max)
    .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), 'must not contain control characters');

/** A target name as `--target` takes it; no spaces or commas, which separate names in flags. */
export const targetSourceName = plain(100).refine((s) => /^[A-Za-z0-9@._/+:-]+$/.test(s), {
  message: 'may hold only letters, digits and @ . _ / + : -',
});

/** npm's own rule for package names (lower case, optional scope), at most 214 characters. */
const npmPackageName = z
  .string()
  .max(214)
  .regex(/^(@[a-z0-9][a-z0-9._~-]*\/)?[a-z0-9][a-z0-9._~-]*$/, 'must be an npm package name such as complex.js');

/** An exact version (semver), never a range: a target names one version. */
const exactVersion = z
  .string()
  .max(64)
  .regex(
    /^\d+\.\d+\.\d+(-[0-9A-Za-z.-]+)?(\+[0-9A-Za-z.-]+)?$/,
    'must be an exact version such as 2.4.3 (no ranges or tags)',
  );

export const npmTargetSource = z.strictObject({
  kind: z.literal('npm'),
  package: npmPackageName,
  version: exactVersion,
  name: targetSourceName.optional(),
});

export const localTargetSource = z.strictObject({
  kind: z.literal('local'),
  /** A folder holding package.json, or a packed .tgz; relative to the config file's folder (or the working directory for flags). */
  path: plain(4096),
  name: targetSourceName.optional(),
});

export const programTargetSource = z.strictObject({
  kind: z.literal('program'),
  /** The program and its arguments, not through a shell: ["python3", "adapter.py"]. */
  command: z
    .array(plain(4096))
    .min(1, 'must name the program to run, then its arguments')
    .max(64, 'takes at most 64 words (the program and 63 arguments)'),
  /** Working folder, relative like `local.path`. */
  cwd: plain(4096).optional(),
  /** Per-request time limit in ms (stdio-target.ts's default when absent). */
  timeLimitMs: z.number().int().min(100).max(600_000).optional(),
  name: targetSourceName.optional(),
});

export const targetSource = z.discriminatedUnion('kind', [npmTargetSource, localTargetSource, programTargetSource]);

export type TargetSource = z.infer<typeof targetSource>;
export type NpmTargetSource = z.infer<typeof npmTargetSource>;
export type LocalTargetSource = z.infer<typeof localTargetSource>;
export type ProgramTargetSource = z.infer<typeof programTargetSource>;
