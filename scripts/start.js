'use strict';
/* eslint-disable @typescript-eslint/no-require-imports -- a plain CommonJS Node script, run without a build step */
/**
 * `npm start`: runs the HTTPS dev server (webpack serve, port 3000) in the background, records its
 * process id for `npm stop`, waits until it answers, then
 *   - on Windows and macOS sideloads manifest.xml into desktop Excel with office-addin-debugging;
 *   - on Linux (no desktop Excel) prints the steps to upload manifest.xml in Excel on the web.
 * The server's output goes to node_modules/.cache/sunpane/dev-server.log.
 */
const { spawn, spawnSync } = require('node:child_process');
const fs = require('node:fs');
const https = require('node:https');
const path = require('node:path');

const ROOT = path.resolve(__dirname, '..');
const STATE_DIR = path.join(ROOT, 'node_modules', '.cache', 'sunpane');
const PID_FILE = path.join(STATE_DIR, 'dev-server.pid');
const LOG_FILE = path.join(STATE_DIR, 'dev-server.log');
const PORT = 3000;
const URL_PROBE = `https://localhost:${PORT}/taskpane.html`;
const WAIT_MS = 180000;

function isRunning(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** Resolves true when the dev server answers 200 (its certificate is self-signed: not checked here). */
function probe() {
  return new Promise((resolve) => {
    const req = https.get(URL_PROBE, { rejectUnauthorized: false, timeout: 2000 }, (res) => {
      res.resume();
      resolve(res.statusCode === 200);
    });
    req.on('error', () => resolve(false));
    req.on('timeout', () => {
      req.destroy();
      resolve(false);
    });
  });
}

function tail(file, lines) {
  try {
    return fs.readFileSync(file, 'utf8').split('\n').slice(-lines).join('\n');
  } catch {
    return '(no log)';
  }
}

const LINUX_STEPS = `
Desktop Excel does not run on Linux: use Excel on the web.
  1. Open ${URL_PROBE} in the browser you use for Excel on the web and accept the
     self-signed certificate once (Advanced → Proceed). The page shows the Sunpane pane text.
  2. Open a workbook in Excel on the web (https://www.office.com → Excel).
  3. Home → Add-ins → More Add-ins (or "Get Add-ins") → My Add-ins → Upload My Add-in,
     choose ${path.join(ROOT, 'manifest.xml')} and Upload.
  4. Type =SUNPANE. in a cell for the functions; Home → Window gain opens the pane.
Stop the server with: npm stop
`;

async function main() {
  fs.mkdirSync(STATE_DIR, { recursive: true });
  if (fs.existsSync(PID_FILE)) {
    const old = Number(fs.readFileSync(PID_FILE, 'utf8'));
    if (old > 0 && isRunning(old)) {
      console.log(`The dev server is already running (process ${old}). Use \`npm stop\` first to restart it.`);
      return 0;
    }
    fs.unlinkSync(PID_FILE);
  }
  if (await probe()) {
    console.error(`Something else already answers on port ${PORT}; stop it first.`);
    return 1;
  }
  const log = fs.openSync(LOG_FILE, 'w');
  const webpackCli = require.resolve('webpack-cli/bin/cli.js');
  // detached: the server leads its own process group, so `npm stop` can end it with its children.
  const child = spawn(process.execPath, [webpackCli, 'serve', '--mode', 'development'], {
    cwd: ROOT,
    detached: process.platform !== 'win32',
    stdio: ['ignore', log, log],
    windowsHide: true,
  });
  fs.writeFileSync(PID_FILE, String(child.pid));
  child.unref();
  console.log(`Starting the dev server (process ${child.pid}); log: ${path.relative(ROOT, LOG_FILE)}`);

  const started = Date.now();
  while (!(await probe())) {
    if (!isRunning(child.pid) || child.exitCode !== null) {
      console.error(`The dev server exited:\n${tail(LOG_FILE, 30)}`);
      fs.rmSync(PID_FILE, { force: true });
      return 1;
    }
    if (Date.now() - started > WAIT_MS) {
      console.error(`The dev server did not answer at ${URL_PROBE} within ${WAIT_MS / 1000} s:\n${tail(LOG_FILE, 30)}`);
      return 1;
    }
    await new Promise((r) => setTimeout(r, 1000));
  }
  console.log(`The add-in is served at https://localhost:${PORT}/ (functions.json, taskpane.html, manifest.xml).`);

  if (process.platform === 'win32' || process.platform === 'darwin') {
    const cli = require.resolve('office-addin-debugging/cli.js');
    const sideload = spawnSync(process.execPath, [cli, 'start', path.join(ROOT, 'manifest.xml'), 'desktop', '--app', 'excel', '--no-debug', '--dev-server-port', String(PORT)], { cwd: ROOT, stdio: 'inherit' });
    if (sideload.status !== 0) {
      console.error('Sideloading failed; add the add-in by hand: Excel → Insert → Add-ins → My Add-ins → Upload My Add-in → manifest.xml.');
      return 1;
    }
    console.log('Excel opens with Sunpane sideloaded. Stop with: npm stop');
  } else {
    console.log(LINUX_STEPS);
  }
  return 0;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (err) => {
    console.error(`npm start: ${err && err.stack ? err.stack : err}`);
    process.exitCode = 1;
  },
);
