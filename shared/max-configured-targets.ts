/**
 * The most target sources one command takes, from the project file and the flags together. A plan
 * runs every suite against every target, so a list past this is a mistake (or an attack on the
 * cache folder), not a project.
 */
export const MAX_CONFIGURED_TARGETS = 64;
