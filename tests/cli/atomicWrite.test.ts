/** Atomic output: complete file or nothing, and clear errors for unwritable paths. */
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import { CliInputError } from '../../src/cli/cliError';
import { checkOutput, ensureFolder, openAtomicOutput, writeFileAtomic } from '../../src/cli/atomicWrite';

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

  it('replaces an existing file only when asked (force), and only when the new one is complete', async () => {
    const dir = tempDir();
    const file = path.join(dir, 'out.csv');
    fs.writeFileSync(file, 'old');
    await expect(writeFileAtomic(file, 'new')).rejects.toThrow(new CliInputError(`${file} exists: give --force to replace it`));
    expect(fs.readFileSync(file, 'utf8')).toBe('old');
    await writeFileAtomic(file, 'new', { force: true });
    expect(fs.readFileSync(file, 'utf8')).toBe('new');
    expect(fs.readdirSync(dir)).toEqual(['out.csv']);
  });

  it('never replaces a read-only file, and says so before any work is done', async () => {
    const dir = tempDir();
    const file = path.join(dir, 'out.csv');
    fs.writeFileSync(file, 'kept');
    fs.chmodSync(file, 0o444);
    expect(() => checkOutput(file, { force: true })).toThrow(new CliInputError(`${file} is read-only: not replaced`));
    await expect(writeFileAtomic(file, 'new', { force: true })).rejects.toThrow(/is read-only: not replaced/);
    expect(fs.readFileSync(file, 'utf8')).toBe('kept');
    expect(fs.readdirSync(dir)).toEqual(['out.csv']);
  });

  it('a file that appears while the output is being written is not replaced (no --force)', async () => {
    const dir = tempDir();
    const file = path.join(dir, 'out.csv');
    const out = openAtomicOutput(file);
    out.stream.write('new');
    fs.writeFileSync(file, 'someone else');
    await expect(out.commit()).rejects.toThrow(/exists: give --force/);
    expect(fs.readFileSync(file, 'utf8')).toBe('someone else');
    expect(fs.readdirSync(dir)).toEqual(['out.csv']);
  });

  it('an output given up (abort) leaves neither the target nor a temporary file', async () => {
    const dir = tempDir();
    const out = openAtomicOutput(path.join(dir, 'out.csv'));
    out.stream.write('half');
    await out.abort();
    expect(fs.readdirSync(dir)).toEqual([]);
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
