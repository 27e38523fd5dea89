/**
 * Property fuzzing from the registry, part "gainHour" (see tests/support/registryFuzz.ts for the
 * generators, the properties and the run counts; docs/testing.md for running larger counts).
 */
import { fuzzPart, messagesInUsersWords } from '../support/registryFuzz';

fuzzPart('gainHour', 'tests/registry/fuzz-gain-hour.test.ts');
messagesInUsersWords('gainHour');
