/** Worksheet-function descriptors: gain. */
import type { FunctionDescriptor } from './types';

export const GAIN_FUNCTIONS: readonly FunctionDescriptor[] = [];
