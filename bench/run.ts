/**
 * `npm run bench`: every benchmark section in one run; a readable table, then, as the LAST line,
 * one JSON object of ratios (ours / peer, median times; below 1 means we are faster).
 */
import type { BenchSection } from './harness';

const SECTIONS: { file: string; exportName: string }[] = [
  { file: './sun', exportName: 'sunBench' },
  { file: './events', exportName: 'eventsBench' },
  { file: './shading', exportName: 'shadingBench' },
  { file: './annual', exportName: 'annualBench' },
  { file: './viewFactors', exportName: 'viewFactorsBench' },
  { file: './ranges', exportName: 'rangesBench' },
  { file: './schedule', exportName: 'scheduleBench' },
];

function main(): void {
  const ratios: Record<string, number> = {};
  for (const { file, exportName } of SECTIONS) {
    let section: BenchSection;
    try {
      // eslint-disable-next-line @typescript-eslint/no-require-imports
      const mod = require(file) as Record<string, () => BenchSection>;
      section = mod[exportName]();
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'MODULE_NOT_FOUND' && String((err as Error).message).includes(file.slice(2))) continue;
      throw err;
    }
    console.log(`\n${section.title}`);
    console.log(`${'work'.padEnd(64)} ${'median ms'.padStart(10)} ${'µs / eval'.padStart(10)}`);
    for (const t of section.timings) {
      console.log(`${t.label.padEnd(64)} ${t.medianMs.toFixed(3).padStart(10)} ${((t.medianMs * 1000) / t.operations).toFixed(3).padStart(10)}`);
    }
    for (const [k, v] of Object.entries(section.ratios)) console.log(`  ${k} = ${v}`);
    Object.assign(ratios, section.ratios);
  }
  console.log(JSON.stringify(ratios));
}

main();
