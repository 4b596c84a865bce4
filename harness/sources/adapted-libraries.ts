/**
 * The npm packages the harness has an in-process adapter for; an `npm` or `local` source naming
 * any other is refused (a library in another language, or any other package, can be wrapped as a
 * `program` source speaking docs/stdio-protocol.md).
 */
export const ADAPTED_LIBRARIES = ['complex.js', 'mathjs'] as const;

export type AdaptedLibrary = (typeof ADAPTED_LIBRARIES)[number];
