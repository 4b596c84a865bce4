import { ADAPTED_LIBRARIES } from './adapted-libraries';

/** The refusal of a package the harness has no adapter for, naming it (and the folder or file holding it) and the way that does work. */
export function noAdapterError(packageName: string, where?: string): Error {
  return new Error(
    `${where ? `${where} holds ` : ''}the package "${packageName.slice(0, 214)}", which has no adapter in the harness (it has ${ADAPTED_LIBRARIES.join(' and ')}); check any other library as a program source speaking the stdio protocol (docs/stdio-protocol.md)`,
  );
}
