/**
 * Writing an output file safely: the bytes go to a temporary file in the target folder, which
 * becomes the target only once it is complete, so a failure never leaves a partial file.
 *
 * An existing target is replaced only when the user asks (`--force`), and a read-only one never
 * (read-only meaning: no write permission for anyone, or none for this user; the mode bits are
 * checked as well as access, because the administrator account may write anything). Without
 * `--force` the complete file is linked to the target name, which fails if the name appeared in
 * the meantime, so even a file created while Sunpane was working is not replaced.
 *
 * Temporary files are removed when a run fails, when it is interrupted (Ctrl+C, a termination
 * signal) and when the process ends early for any other reason; only a hard kill (SIGKILL) or a
 * power cut can leave one, always named `.NAME.….partial` beside the target, never the target.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { CliInputError } from './cliError';

/** How an output may treat an existing file of its name. */
export interface OutputOptions {
  /** Replace an existing (writable) file; default false: refuse. */
  force?: boolean;
}

/** Temporary files of this process not yet committed or removed. */
const pendingTemps = new Set<string>();
let cleanupInstalled = false;

function removePendingTemps(): void {
  for (const t of pendingTemps) {
    try {
      fs.rmSync(t, { force: true });
    } catch {
      // nothing more can be done while the process ends
    }
  }
  pendingTemps.clear();
}

/**
 * Removes unfinished temporary files when the process ends early: on exit, and on SIGINT / SIGTERM /
 * SIGHUP, after which it exits with the shell's usual status for the signal (128 + its number).
 */
function installCleanup(): void {
  if (cleanupInstalled) return;
  cleanupInstalled = true;
  process.on('exit', removePendingTemps);
  for (const [signal, number] of [['SIGINT', 2], ['SIGTERM', 15], ['SIGHUP', 1]] as const) {
    process.on(signal, () => {
      removePendingTemps();
      process.exit(128 + number);
    });
  }
}

function tempPathFor(target: string): string {
  const dir = path.dirname(path.resolve(target));
  return path.join(dir, `.${path.basename(target)}.${process.pid}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}.partial`);
}

/** True when nobody may write the file, or this process may not. */
function isReadOnly(file: string, stat: fs.Stats): boolean {
  if ((stat.mode & 0o222) === 0) return true;
  try {
    fs.accessSync(file, fs.constants.W_OK);
    return false;
  } catch {
    return true;
  }
}

/**
 * Checks, before any work is done, that `target` may be written: refuses an existing file without
 * `force`, a read-only file in any case, and a folder.
 * @throws CliInputError naming the path and what to do
 */
export function checkOutput(target: string, options: OutputOptions = {}): void {
  let stat: fs.Stats;
  try {
    stat = fs.statSync(target);
  } catch {
    return; // absent (or unreachable: the write itself reports why)
  }
  if (stat.isDirectory()) throw new CliInputError(`cannot write ${target}: it is a folder`);
  if (isReadOnly(target, stat)) throw new CliInputError(`${target} is read-only: not replaced`);
  if (!options.force) throw new CliInputError(`${target} exists: give --force to replace it`);
}

/** Makes the complete temporary file the target (link without force, rename with it). */
async function commit(temp: string, target: string, options: OutputOptions): Promise<void> {
  if (options.force) {
    checkOutput(target, options);
    await fs.promises.rename(temp, target);
    return;
  }
  try {
    await fs.promises.link(temp, target);
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === 'EEXIST') {
      checkOutput(target, options); // says why: a folder, read-only, or simply there
      throw new CliInputError(`${target} exists: give --force to replace it`);
    }
    // A file system without hard links: check, then rename (a file appearing in between is replaced).
    if (code !== 'EPERM' && code !== 'ENOTSUP' && code !== 'ENOSYS' && code !== 'EXDEV' && code !== 'EMLINK') throw err;
    checkOutput(target, options);
    await fs.promises.rename(temp, target);
    return;
  }
  await fs.promises.rm(temp, { force: true });
}

/**
 * Writes `data` to `target` through a temporary sibling file.
 * @param target - output path; its folder must exist (use {@link ensureFolder} first if not)
 * @param data - the whole file content
 * @param options - `force` to replace an existing (writable) file
 * @throws CliInputError naming the path when the folder is missing or not writable, or the target
 *   exists (without force) or is read-only
 */
export async function writeFileAtomic(target: string, data: Uint8Array | string, options: OutputOptions = {}): Promise<void> {
  const out = openAtomicOutput(target, options);
  try {
    await new Promise<void>((resolve, reject) => {
      out.stream.on('error', reject);
      out.stream.end(data, () => resolve());
    });
  } catch (err) {
    await out.abort();
    throw new CliInputError(`cannot write ${target}: ${describeFsError(err)}`);
  }
  await out.commit();
}

/** An output file being written piece by piece: a temporary file until {@link AtomicOutput.commit}. */
export interface AtomicOutput {
  /** Where the pieces go (a temporary file beside the target). */
  stream: fs.WriteStream;
  /** Flushes the stream and makes the temporary file the target. */
  commit(): Promise<void>;
  /** Closes and removes the temporary file; the target is untouched. */
  abort(): Promise<void>;
}

/**
 * Opens a temporary file beside `target` for streaming output (large CSV and workbook files are
 * written as they are computed, not held in memory). Nothing appears under the target's name until
 * {@link AtomicOutput.commit}.
 * @param target - output path
 * @param options - `force` to replace an existing (writable) file
 */
export function openAtomicOutput(target: string, options: OutputOptions = {}): AtomicOutput {
  installCleanup();
  const temp = tempPathFor(target);
  pendingTemps.add(temp);
  const stream = fs.createWriteStream(temp, { flags: 'wx' });
  let failure: unknown;
  stream.on('error', (err) => (failure ??= err));
  const closed = () =>
    new Promise<void>((resolve) => {
      if (stream.closed) resolve();
      else stream.once('close', () => resolve());
    });
  const remove = async () => {
    await fs.promises.rm(temp, { force: true }).catch(() => undefined);
    pendingTemps.delete(temp);
  };
  return {
    stream,
    async commit() {
      if (!stream.writableEnded) stream.end();
      await closed();
      try {
        if (failure) throw failure;
        await commit(temp, target, options);
      } catch (err) {
        await remove();
        if (err instanceof CliInputError) throw err;
        throw new CliInputError(`cannot write ${target}: ${describeFsError(err)}`);
      }
      pendingTemps.delete(temp);
    },
    async abort() {
      stream.destroy();
      await closed();
      await remove();
    },
  };
}

/** Creates a folder (and its parents) for output; a clear error when that is impossible. */
export async function ensureFolder(dir: string): Promise<void> {
  try {
    await fs.promises.mkdir(dir, { recursive: true });
  } catch (err) {
    throw new CliInputError(`cannot create the folder ${dir}: ${describeFsError(err)}`);
  }
}

/** A short reason for a file-system error, without the stack. */
export function describeFsError(err: unknown): string {
  const code = (err as NodeJS.ErrnoException | undefined)?.code;
  switch (code) {
    case 'ENOENT':
      return 'the folder does not exist';
    case 'EACCES':
    case 'EPERM':
      return 'permission denied';
    case 'EROFS':
      return 'the file system is read-only';
    case 'ENOTDIR':
      return 'a part of the path is not a folder';
    case 'EISDIR':
      return 'it is a folder';
    case 'ENOSPC':
      return 'no space left on the device';
    default:
      return err instanceof Error ? err.message : String(err);
  }
}
