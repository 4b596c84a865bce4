import { ADAPTED_LIBRARIES } from './adapted-libraries';

/** The refusal of a package the harness has no adapter for, naming it and the way that does work. */
export function noAdapterError(what: string, packageName: string): Error {
  return new Error(
    `${what} is the package "${packageName.slice(0, 214)}"; the harness has adapters for ${ADAPTED_LIBRARIES.join(' and ')} only (check any other library as a program source speaking the stdio protocol, docs/stdio-protocol.md)`,
  );
}
