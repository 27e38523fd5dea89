/** Worksheet-function descriptors: shading. */
import type { FunctionDescriptor } from './types';

export const SHADING_FUNCTIONS: readonly FunctionDescriptor[] = [];
