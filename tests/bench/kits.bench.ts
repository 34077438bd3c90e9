/**
 * `npm run bench:kits`: the full PDF kit (patterns → layout → PDF) of each demo model, timed N times after a
 * warm-up, with min / median / max and the peak resident memory of the process; then a cylinder at 16, 64 and
 * 256 facets to show how time grows with facet count. A script, not a test: it prints figures and checks
 * the issue-4 targets (Skein probe 1:20 on Letter ≤ 100 ms median, ≤ 200 MB peak RSS), the issue-16 one (the
 * same kit ≤ 50 ms median) and the instructions pages' share (≤ 50 ms, issue 10) without failing CI.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { buildKit } from '../../src/lib/kit/build-kit';
import type { KitOutput } from '../../src/lib/kit/build-kit';
import { KitRequestSchema } from '../../src/lib/kit/kit-request';
import type { KitRequestInput } from '../../src/lib/kit/kit-request';
import { kitFonts } from '../../src/lib/kit/fonts.server';
import { pdfKit } from '../../src/lib/render/pdf-kit';

const RUNS = Number(process.env.KW_BENCH_RUNS ?? 30);
const WARMUP = 5;
const root = fileURLToPath(new URL('../../', import.meta.url));

let peakRssMb = 0;
const sampleRss = () => {
  peakRssMb = Math.max(peakRssMb, process.memoryUsage().rss / 2 ** 20);
};
const sampler = setInterval(sampleRss, 5);

async function bench(name: string, input: KitRequestInput, outputs: KitOutput[] = ['pdf']) {
  const fonts = await kitFonts(root);
  const request = KitRequestSchema.parse(input);
  let sheets = 0;
  let bytes = 0;
  for (let i = 0; i < WARMUP; i++) await buildKit(request, fonts, { outputs });
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    const kit = await buildKit(request, fonts, { outputs });
    times.push(performance.now() - t0);
    sampleRss();
    sheets = kit.layout.sheets.length;
    bytes = kit.pdf?.length ?? 0;
  }
  times.sort((a, b) => a - b);
  const median =
    times.length % 2 ? times[(times.length - 1) / 2]! : (times[times.length / 2 - 1]! + times[times.length / 2]!) / 2;
  const f = (ms: number) => ms.toFixed(1).padStart(7);
  console.log(
    `${name.padEnd(34)} min ${f(times[0]!)} ms  median ${f(median)} ms  max ${f(times[times.length - 1]!)} ms  ` +
      `${String(sheets).padStart(3)} sheets  ${(bytes / 1024).toFixed(0).padStart(4)} kB PDF  peak RSS so far ${peakRssMb.toFixed(0)} MB`,
  );
  return median;
}

const models = readdirSync(`${root}content/models`)
  .filter((f) => f.endsWith('.json'))
  .map(
    (f) =>
      JSON.parse(readFileSync(`${root}content/models/${f}`, 'utf8')) as { id: string; title: string; model: unknown },
  );
const base = {
  sheetSizeId: 'letter',
  paperGsm: 160,
  copies: 1,
  units: 'us',
  qrUrl: 'https://kitwright.example/kits/bench',
} as const;
const defaultScale: Record<string, number> = { 'skein-probe': 20, 'wren-3u': 2, 'thermal-puck': 5 };

console.log(`Kit benchmark: ${RUNS} runs after ${WARMUP} warm-up, Node ${process.version}, PDF only unless noted\n`);
let skeinMedian = NaN;
let skeinPeakRssMb = NaN;
let instructionsMedian = NaN;
// The headline case runs first, so the process's peak memory while building it is measured on its own.
models.sort((a, b) => Number(b.id === 'skein-probe') - Number(a.id === 'skein-probe'));
for (const m of models) {
  const scale = defaultScale[m.id] ?? 20;
  const median = await bench(`${m.id} 1:${scale} Letter`, {
    ...base,
    model: m.model,
    title: m.title,
    scaleDenominator: scale,
  } as KitRequestInput);
  if (m.id === 'skein-probe') {
    skeinMedian = median;
    skeinPeakRssMb = peakRssMb;
  }
}
const skein = models.find((m) => m.id === 'skein-probe');
if (skein) {
  await bench(
    'skein-probe 1:20 Letter, all outputs',
    { ...base, model: skein.model, scaleDenominator: 20 } as KitRequestInput,
    ['pdf', 'svg', 'stl', 'json'],
  );
  // What the instructions pages add: the PDF of the same layout with its sheets left out is the instructions
  // pages alone, document and font subset included, so an upper bound of their share of the full kit's time.
  const fonts = await kitFonts(root);
  const { layout } = await buildKit(
    KitRequestSchema.parse({ ...base, model: skein.model, scaleDenominator: 20 }),
    fonts,
    { outputs: [] },
  );
  const instructionsOnly = { ...layout, sheets: [] };
  for (let i = 0; i < WARMUP; i++) pdfKit(instructionsOnly, fonts);
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    pdfKit(instructionsOnly, fonts);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  instructionsMedian = times[Math.floor(times.length / 2)]!;
  console.log(
    `${'skein-probe 1:20, instructions only'.padEnd(34)} min ${times[0]!.toFixed(1).padStart(7)} ms  median ` +
      `${instructionsMedian.toFixed(1).padStart(7)} ms  max ${times[times.length - 1]!.toFixed(1).padStart(7)} ms`,
  );
  await bench('skein-probe 1:20 Letter, 12 copies', {
    ...base,
    model: skein.model,
    scaleDenominator: 20,
    copies: 12,
  } as KitRequestInput);
}
console.log('\nCylinder 0.5 m × 0.3 m at 1:5 on Letter, by facet count:');
for (const facets of [16, 64, 256]) {
  const model = {
    schemaVersion: 1,
    name: `Cylinder ${facets}`,
    body: { kind: 'cylinder', diameterM: 0.5, heightM: 0.3, facets },
    appendages: [],
  };
  await bench(`cylinder ${facets} facets`, { ...base, model, scaleDenominator: 5 } as KitRequestInput);
}
clearInterval(sampler);
sampleRss();
console.log(
  `\nPeak resident memory: ${skeinPeakRssMb.toFixed(0)} MB after the Skein runs, ${peakRssMb.toFixed(0)} MB for the whole script`,
);
console.log(
  `Targets: Skein 1:20 Letter median ${skeinMedian.toFixed(1)} ms (≤ 100 ms, issue 4: ${skeinMedian <= 100 ? 'met' : 'MISSED'}; ` +
    `≤ 50 ms, issue 16: ${skeinMedian <= 50 ? 'met' : 'MISSED'}), ` +
    `peak RSS ${skeinPeakRssMb.toFixed(0)} MB (≤ 200 MB: ${skeinPeakRssMb <= 200 ? 'met' : 'MISSED'}), ` +
    `instructions pages at most ${instructionsMedian.toFixed(1)} ms (≤ 50 ms: ${instructionsMedian <= 50 ? 'met' : 'MISSED'})`,
);
