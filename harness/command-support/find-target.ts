import { discoverTargets } from '../adapters/discover-targets';
import type { TargetDescriptor } from '../adapters/target-descriptor';
import { BadInput } from './bad-input';

/** The installed target named exactly as `sheetkeeper targets` lists it ("complex.js@2.4.3", "mathjs@15.2.0/complex", "cmath@3.11.2"). */
export function findTarget(name: string): TargetDescriptor {
  const all = discoverTargets();
  const found = all.find((d) => d.name === name);
  if (!found) throw new BadInput(`no installed target "${name}"; installed: ${all.map((d) => d.name).join(', ')}`);
  return found;
}
