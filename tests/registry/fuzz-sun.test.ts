/**
 * Property fuzzing from the registry, part "sun" (see tests/support/registryFuzz.ts for the
 * generators, the properties and the run counts; docs/testing.md for running larger counts).
 */
import { coverageTests, fuzzPart, messagesInUsersWords } from '../support/registryFuzz';

coverageTests();

fuzzPart('sun', 'tests/registry/fuzz-sun.test.ts');
messagesInUsersWords('sun');
