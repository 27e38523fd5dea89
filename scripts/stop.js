'use strict';
/* eslint-disable @typescript-eslint/no-require-imports -- a plain CommonJS Node script, run without a build step */
/**
 * `npm stop`: ends the dev server that `npm start` recorded, with its whole process group (killing
 * only `webpack serve` can orphan its child — docs/platform.md#developing-on-linux), and on Windows and macOS removes the
 * sideloaded add-in.
 */
const { spawnSync } = require('node:child_process');
const fs = require('node:fs');
const path = require('node:path');

const ROOT = path.resolve(__dirname, '..');
const PID_FILE = path.join(ROOT, 'node_modules', '.cache', 'sunpane', 'dev-server.pid');

function isRunning(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

async function main() {
  if (process.platform === 'win32' || process.platform === 'darwin') {
    const cli = require.resolve('office-addin-debugging/cli.js');
    spawnSync(process.execPath, [cli, 'stop', path.join(ROOT, 'manifest.xml')], { cwd: ROOT, stdio: 'inherit' });
  }
  if (!fs.existsSync(PID_FILE)) {
    console.log('No dev server recorded by `npm start`: nothing to stop.');
    return 0;
  }
  const pid = Number(fs.readFileSync(PID_FILE, 'utf8'));
  if (!(pid > 0) || !isRunning(pid)) {
    fs.rmSync(PID_FILE, { force: true });
    console.log(`The recorded dev server (process ${pid}) is not running any more.`);
    return 0;
  }
  if (process.platform === 'win32') {
    spawnSync('taskkill', ['/pid', String(pid), '/T', '/F'], { stdio: 'inherit' });
  } else {
    try {
      process.kill(-pid, 'SIGTERM'); // the whole group: npm start made the server a group leader
    } catch {
      process.kill(pid, 'SIGTERM');
    }
    for (let waited = 0; waited < 5000 && isRunning(pid); waited += 200) await new Promise((r) => setTimeout(r, 200));
    if (isRunning(pid)) {
      try {
        process.kill(-pid, 'SIGKILL');
      } catch {
        /* already gone */
      }
    }
  }
  fs.rmSync(PID_FILE, { force: true });
  console.log(`Stopped the dev server (process ${pid}).`);
  return 0;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (err) => {
    console.error(`npm stop: ${err && err.stack ? err.stack : err}`);
    process.exitCode = 1;
  },
);
