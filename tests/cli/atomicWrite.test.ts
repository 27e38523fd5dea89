/** Atomic output: complete file or nothing, and clear errors for unwritable paths. */
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import { CliInputError } from '../../src/cli/cliError';
import { ensureFolder, writeFileAtomic } from '../../src/cli/atomicWrite';

function tempDir(): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-atomic-'));
}

describe('atomic file writing', () => {
  it('writes the whole content and leaves no temporary file behind', async () => {
    const dir = tempDir();
    await writeFileAtomic(path.join(dir, 'out.csv'), 'a,b\n1,2\n');
    expect(fs.readFileSync(path.join(dir, 'out.csv'), 'utf8')).toBe('a,b\n1,2\n');
    expect(fs.readdirSync(dir)).toEqual(['out.csv']);
  });

  it('replaces an existing file only when the new one is complete', async () => {
    const dir = tempDir();
    const file = path.join(dir, 'out.csv');
    fs.writeFileSync(file, 'old');
    await writeFileAtomic(file, 'new');
    expect(fs.readFileSync(file, 'utf8')).toBe('new');
  });

  it('refuses a path whose folder does not exist, naming the path and leaving nothing', async () => {
    const dir = tempDir();
    const target = path.join(dir, 'missing', 'out.xlsx');
    await expect(writeFileAtomic(target, 'x')).rejects.toThrow(new CliInputError(`cannot write ${target}: the folder does not exist`));
    expect(fs.readdirSync(dir)).toEqual([]);
  });

  it('refuses a path through a file and a target that is a folder, leaving no partial file', async () => {
    const dir = tempDir();
    fs.writeFileSync(path.join(dir, 'plain'), 'x');
    await expect(writeFileAtomic(path.join(dir, 'plain', 'out.csv'), 'x')).rejects.toThrow(/a part of the path is not a folder/);
    fs.mkdirSync(path.join(dir, 'taken'));
    await expect(writeFileAtomic(path.join(dir, 'taken'), 'x')).rejects.toThrow(/cannot write .*taken: /);
    expect(fs.readdirSync(dir).sort()).toEqual(['plain', 'taken']);
  });

  it('creates nested output folders and refuses one under a file', async () => {
    const dir = tempDir();
    await ensureFolder(path.join(dir, 'a', 'b'));
    expect(fs.statSync(path.join(dir, 'a', 'b')).isDirectory()).toBe(true);
    fs.writeFileSync(path.join(dir, 'f'), 'x');
    await expect(ensureFolder(path.join(dir, 'f', 'g'))).rejects.toThrow(CliInputError);
  });
});
