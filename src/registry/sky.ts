/** Worksheet-function descriptors: sky. */
import type { FunctionDescriptor } from './types';

export const SKY_FUNCTIONS: readonly FunctionDescriptor[] = [];
