/** Worksheet-function descriptors: glazing. */
import type { FunctionDescriptor } from './types';

export const GLAZING_FUNCTIONS: readonly FunctionDescriptor[] = [];
