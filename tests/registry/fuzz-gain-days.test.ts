/**
 * Property fuzzing from the registry, part "gainDays" (see tests/support/registryFuzz.ts for the
 * generators, the properties and the run counts; docs/testing.md for running larger counts).
 */
import { fuzzPart, messagesInUsersWords } from '../support/registryFuzz';

fuzzPart('gainDays', 'tests/registry/fuzz-gain-days.test.ts');
messagesInUsersWords('gainDays');
