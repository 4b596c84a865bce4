import { installedTargets } from '../adapters/installed-targets';
import { knownTargetsText } from '../adapters/known-targets-text';
import type { TargetDescriptor } from '../adapters/target-descriptor';
import { BadInput } from './bad-input';

/**
 * The target named exactly as `sheetkeeper targets` lists it ("complex.js@2.4.3", "mathjs@15.2.0/complex",
 * "cmath@3.11.2", a configured "complex.js@2.4.3+local"), among `known` (the installed ones by default;
 * a command passes the configured ones too, command-targets.ts). An unknown name is BadInput listing both kinds.
 */
export function findTarget(name: string, known: readonly TargetDescriptor[] = installedTargets()): TargetDescriptor {
  const found = known.find((d) => d.name === name);
  if (!found) {
    const kinds = known.some((d) => d.from !== undefined) ? 'installed or configured' : 'installed';
    throw new BadInput(`no ${kinds} target "${name}"; ${knownTargetsText(known)}`);
  }
  return found;
}
