/**
 * `npm run fuzz`: the registry's property fuzz (tests/registry/fuzz-*.test.ts) with every function
 * run FUZZ_RUNS times (default 10,000, the heavy ones included) under a fresh seed, printed first so
 * that a failure can be replayed: FUZZ_SEED=<seed> FUZZ_RUNS=<runs> npm run fuzz.
 * Extra arguments go to jest (e.g. `npm run fuzz -- -t SOLARGAINYEAR`).
 */
import { spawnSync } from 'node:child_process';

const runs = process.env.FUZZ_RUNS && process.env.FUZZ_RUNS !== '' ? process.env.FUZZ_RUNS : '10000';
const seed = process.env.FUZZ_SEED && process.env.FUZZ_SEED !== '' ? process.env.FUZZ_SEED : String(Date.now() % 2_147_483_647);
process.stdout.write(`fuzz: FUZZ_RUNS=${runs} FUZZ_SEED=${seed} (replay with these two)\n`);
const jest = require.resolve('jest/bin/jest');
const result = spawnSync(process.execPath, [jest, 'tests/registry/fuzz-', ...process.argv.slice(2)], {
  stdio: 'inherit',
  env: { ...process.env, FUZZ_RUNS: runs, FUZZ_SEED: seed, FUZZ_REPORT: process.env.FUZZ_REPORT ?? '1' },
});
process.stdout.write(`fuzz: FUZZ_RUNS=${runs} FUZZ_SEED=${seed}\n`);
process.exit(result.status ?? 1);
