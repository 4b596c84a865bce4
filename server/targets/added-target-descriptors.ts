import { resolveTargetSource, type Target, type TargetDescriptor } from '../../harness';
import type { TargetSource } from '../../shared/target-source';

type ResolveOptions = Parameters<typeof resolveTargetSource>[1];

/**
 * The descriptors of admin-added sources, resolved in this process (or thread) the first time one
 * of their targets is opened and kept by the source's row id, so later opens only start a fresh
 * target: an npm version is installed once, a program described once. A resolution that fails is
 * forgotten, so the next open tries again; a row removed and added again has a new id.
 */
export class AddedTargetDescriptors {
  private readonly resolved = new Map<string, Promise<TargetDescriptor[]>>();

  constructor(
    private readonly options: ResolveOptions,
    private readonly resolve: typeof resolveTargetSource = resolveTargetSource,
  ) {}

  /** Opens the target `name` of the source stored as row `id`; null when the source no longer names it. */
  async open(id: string, source: TargetSource, name: string): Promise<Target | null> {
    let descriptors = this.resolved.get(id);
    if (!descriptors) {
      descriptors = this.resolve(source, this.options);
      this.resolved.set(id, descriptors);
      descriptors.catch(() => this.resolved.delete(id));
    }
    return (await descriptors).find((d) => d.name === name)?.open() ?? null;
  }
}
