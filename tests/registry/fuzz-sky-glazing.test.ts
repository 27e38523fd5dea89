/**
 * Property fuzzing from the registry, part "skyGlazing" (see tests/support/registryFuzz.ts for the
 * generators, the properties and the run counts; docs/testing.md for running larger counts).
 */
import { fuzzPart, messagesInUsersWords } from '../support/registryFuzz';

fuzzPart('skyGlazing', 'tests/registry/fuzz-sky-glazing.test.ts');
messagesInUsersWords('skyGlazing');
