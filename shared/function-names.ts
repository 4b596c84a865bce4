import { FUNCTION_ARITY, type FunctionName } from './function-arity';

/** The names of the catalogue's maths functions, in its order (shared/function-arity.ts). */
export const FUNCTION_NAMES = Object.keys(FUNCTION_ARITY) as readonly FunctionName[];
