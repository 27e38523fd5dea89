/** Worksheet-function descriptors: sun. */
import type { FunctionDescriptor } from './types';

export const SUN_FUNCTIONS: readonly FunctionDescriptor[] = [];
