'use strict';
/* eslint-disable @typescript-eslint/no-require-imports -- a plain CommonJS Node script, run without a build step */
/**
 * `npm test`'s pretest: lint, the dependency rules, the typecheck and both builds, two at a time.
 *
 * Each step is the package.json script of its name, run as `npm run <name>`, so what a step does is
 * said once, there. They read the sources and write apart (the command-line build to lib/, the
 * add-in to dist/; lint, rules and typecheck write nothing), and each is mostly one process on one
 * core, so two at once take about half the time of one after another on the 2-core machine
 * (docs/testing.md#keeping-npm-test-fast). The longest, the add-in build, starts first.
 *
 * A step's output is printed whole when it ends, under its name and time, so two steps never
 * interleave. Every step runs even when one fails (all the findings at once); the script then exits
 * 1 and jest does not start.
 */
const { spawn } = require('node:child_process');

/** Longest first: the add-in build, lint, typecheck, the command-line build, the dependency rules. */
const STEPS = ['build', 'lint', 'typecheck', 'build:cli', 'deps'];
const AT_ONCE = 2;
const NPM = process.platform === 'win32' ? 'npm.cmd' : 'npm';

/** Runs `npm run <name>`; resolves with its exit code and its output (stdout and stderr as they came). */
function runStep(name) {
  return new Promise((resolve) => {
    const started = process.hrtime.bigint();
    const chunks = [];
    const child = spawn(NPM, ['run', name], { stdio: ['ignore', 'pipe', 'pipe'], shell: process.platform === 'win32' });
    child.stdout.on('data', (c) => chunks.push(c));
    child.stderr.on('data', (c) => chunks.push(c));
    const finish = (code, error) => {
      const seconds = Number(process.hrtime.bigint() - started) / 1e9;
      if (error) chunks.push(Buffer.from(`${error.message}\n`));
      resolve({ name, code, seconds, output: Buffer.concat(chunks).toString('utf8') });
    };
    child.on('error', (err) => finish(1, err));
    child.on('close', (code, signal) => finish(code ?? (signal ? 1 : 0)));
  });
}

async function main() {
  const started = process.hrtime.bigint();
  const queue = [...STEPS];
  const failed = [];
  const worker = async () => {
    for (let name = queue.shift(); name !== undefined; name = queue.shift()) {
      const r = await runStep(name);
      process.stdout.write(`\n── npm run ${r.name}: ${r.code === 0 ? 'done' : `FAILED (exit ${r.code})`} in ${r.seconds.toFixed(1)} s\n${r.output}`);
      if (r.code !== 0) failed.push(r.name);
    }
  };
  await Promise.all(Array.from({ length: AT_ONCE }, worker));
  const total = (Number(process.hrtime.bigint() - started) / 1e9).toFixed(1);
  if (failed.length > 0) {
    process.stderr.write(`\npretest: ${failed.join(', ')} failed (${total} s): jest not started\n`);
    process.exit(1);
  }
  process.stdout.write(`\npretest: ${STEPS.join(', ')} passed in ${total} s, ${AT_ONCE} at a time\n`);
}

main();
