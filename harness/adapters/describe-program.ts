import type { ProgramTargetSource } from '../../shared/target-source';
import { conventionSchema } from '../../shared/schemas/convention-schema';
import type { TargetEntry } from '../../shared/target-entry';
import { programTarget, type ProgramIdentity } from './program-target';

/**
 * What a `program` target source (shared/target-source.ts) is: the program is started once to
 * answer `describe` (docs/stdio-protocol.md), which names its library, version and entries, and
 * closed again; resolveTargetSource makes the identity a target that opens a fresh one on first use. `baseDir` is the folder the
 * source's relative `cwd` is read from. Rejects with a message naming what the program got wrong
 * (it did not start, did not answer in time, or its answer lacks a library or version).
 */
export async function describeProgram(source: ProgramTargetSource, baseDir: string): Promise<ProgramIdentity> {
  const probe = programTarget(source, baseDir, { name: source.name ?? 'program', library: 'program', version: '?' });
  const command = probe.settings.command;
  try {
    const answer = await probe.request('describe', []);
    if ('error' in answer) throw new Error(`${command}: describe failed: ${answer.error}`);
    const { library, version, entries, convention } = answer.reply as {
      library?: unknown;
      version?: unknown;
      entries?: unknown;
      convention?: unknown;
    };
    if (typeof library !== 'string' || library.trim() === '')
      throw new Error(`${command}: describe answered no "library"`);
    if (typeof version !== 'string' || version.trim() === '')
      throw new Error(`${command}: describe answered no "version"`);
    const declared = convention === undefined ? undefined : conventionSchema.safeParse(convention);
    if (declared && !declared.success)
      throw new Error(
        `${command}: describe answered convention ${JSON.stringify(convention)}; it must be signed-zero or counter-clockwise, or absent`,
      );
    return {
      name: source.name ?? `${library}@${version}`,
      library,
      version,
      ...(Array.isArray(entries) ? { entries: entries as TargetEntry[] } : {}),
      ...(declared ? { convention: declared.data } : {}),
    };
  } finally {
    await probe.close();
  }
}
