import { FUNCTION_ARITY } from '../../shared/function-arity';
import { FUNCTION_NAMES } from '../../shared/function-names';

/** The catalogue functions of one argument (shared/function-arity.ts); pow and nthroot have rules of their own. */
export const ONE_ARGUMENT_FUNCTIONS: ReadonlySet<string> = new Set(
  FUNCTION_NAMES.filter((name) => FUNCTION_ARITY[name] === 1),
);
