/**
 * Where an admin-added target source stands (docs/libraries-screen.md): `resolving` while the
 * server installs or describes it in the background, `ready` once its targets are recorded and can
 * be planned, `failed` with the reason when it could not be resolved. The table's CHECK constraint
 * (migration 1764910000000) lists the same words.
 */
export const TARGET_SOURCE_STATES = ['resolving', 'ready', 'failed'] as const;

export type TargetSourceState = (typeof TARGET_SOURCE_STATES)[number];
