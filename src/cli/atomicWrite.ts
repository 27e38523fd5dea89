/**
 * Writing an output file safely: the bytes go to a temporary file in the target folder, which is
 * renamed over the target only once it is complete, so a failure never leaves a partial file.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { CliInputError } from './cliError';

/**
 * Writes `data` to `target` through a temporary sibling file and a rename.
 * @param target - output path; its folder must exist (use {@link ensureFolder} first if not)
 * @param data - the whole file content
 * @throws CliInputError naming the path when the folder is missing or not writable
 */
export async function writeFileAtomic(target: string, data: Uint8Array | string): Promise<void> {
  const dir = path.dirname(path.resolve(target));
  const temp = path.join(dir, `.${path.basename(target)}.${process.pid}.${Date.now().toString(36)}.partial`);
  try {
    await fs.promises.writeFile(temp, data, { flag: 'wx' });
    await fs.promises.rename(temp, target);
  } catch (err) {
    await fs.promises.rm(temp, { force: true }).catch(() => undefined);
    throw new CliInputError(`cannot write ${target}: ${describeFsError(err)}`);
  }
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
