/**
 * `npm run bench:unfold`: import and unfold subdivided icospheres of about 1,000, 10,000 and 50,000 triangles
 * (three.js IcosahedronGeometry written as binary STL) on A4 inside its margins at 160 g/m². Each size runs in
 * a process of its own, so its peak memory is its own: the kernel's peak resident set (getrusage maxrss) of
 * that process (the heap collected before each run), next to its resident set before the mesh was made (Node, tsx and three.js). Per size: parse
 * + check + merge time and unfold time as min / median / max of a few runs after a warm-up, the median CPU
 * time (all threads: garbage collection runs beside the main one), pieces, tabs, taped edges, the fold-back
 * check, and overlap inside every piece judged by polygon-clipping (npm registry; after the timed runs and
 * the memory reading). Then the exponent of time against triangle count, fitted by least squares on log–log
 * (n log n shows as a little above 1). Targets (issue 15): 50,000 triangles unfolded, overlap-free, ≤ 3 s
 * and ≤ 500 MB. Then the same 50,000 triangles through the running app, with /api/health measured meanwhile
 * (unfold-server-figures.ts). Prints figures; fails nothing.
 */
import { fork } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import * as THREE from 'three';
import type { Piece } from '../../src/lib/geometry/types';
import { meshPrepare, meshPreparedUnfold } from '../../src/lib/mesh/mesh-prepare';
import { geometrySoup, pieceOverlapAreaMm2, stlBytes } from '../lib/mesh/mesh-fixtures';
import { unfoldServerFigures } from './unfold-server-figures';

const SIZES = [
  { detail: 6, runs: 5 }, // 980 triangles
  { detail: 21, runs: 3 }, // 9,680
  { detail: 49, runs: 3 }, // 50,000
];
const TARGET = { triangles: 50_000, ms: 3000, mb: 500 };

interface SizeResult {
  triangles: number;
  prepMs: number[];
  unfoldMs: number[];
  cpuMs: number[];
  pieces: number;
  tabs: number;
  taped: number;
  foldBackMm: number;
  overlapMm2: number;
  baseMb: number;
  peakMb: number;
}

function runSize(detail: number, runs: number): SizeResult {
  const baseMb = process.memoryUsage().rss / 2 ** 20;
  const bytes = stlBytes(geometrySoup(new THREE.IcosahedronGeometry(100, detail)), true);
  const out: SizeResult = {
    triangles: (bytes.length - 84) / 50,
    prepMs: [],
    unfoldMs: [],
    cpuMs: [],
    pieces: 0,
    tabs: 0,
    taped: 0,
    foldBackMm: 0,
    overlapMm2: 0,
    baseMb,
    peakMb: 0,
  };
  let last: Piece[] = [];
  for (let r = 0; r <= runs; r++) {
    // Each run starts from a collected heap, so the peak is one unfold's, not one plus the last one's garbage.
    last = [];
    globalThis.gc!();
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    const prepared = meshPrepare(bytes, 'bench.stl');
    const t1 = performance.now();
    const u = meshPreparedUnfold(prepared, {
      unit: 'mm',
      scaleDenominator: 1,
      paperGsm: 160,
      pieceMaxMm: { widthMm: 190, heightMm: 277 },
    });
    const t2 = performance.now();
    const c = process.cpuUsage(c0);
    if (r === runs) last = u.pieces;
    if (r === 0) continue; // warm-up
    out.prepMs.push(t1 - t0);
    out.unfoldMs.push(t2 - t1);
    out.cpuMs.push((c.user + c.system) / 1000);
    Object.assign(out, {
      pieces: u.summary.pieceCount,
      tabs: u.summary.tabCount,
      taped: u.summary.tapedEdgeCount,
      foldBackMm: u.summary.foldBackDeviationMm,
    });
  }
  // getrusage's maxrss is in KiB on Linux. Read before the overlap check, which is not part of the unfold.
  out.peakMb = process.resourceUsage().maxRSS / 1024;
  out.overlapMm2 = last.reduce((s, p) => s + Math.abs(pieceOverlapAreaMm2(p)), 0);
  return out;
}

function inChild(detail: number, runs: number): Promise<SizeResult> {
  return new Promise((resolve, reject) => {
    const child = fork(fileURLToPath(import.meta.url), ['--size', String(detail), String(runs)], {
      execArgv: [...process.execArgv, '--expose-gc'],
    });
    child.once('message', (m) => resolve(m as SizeResult));
    child.once('exit', (code) => (code === 0 ? undefined : reject(new Error(`bench child exited with ${code}`))));
  });
}

const stats = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return { min: s[0]!, median: s[Math.floor(s.length / 2)]!, max: s[s.length - 1]! };
};
const f = (ms: number) => ms.toFixed(0).padStart(6);

/** Least-squares slope of log(time) on log(triangles). */
function exponent(points: [number, number][]): number {
  const xs = points.map(([n]) => Math.log(n)),
    ys = points.map(([, t]) => Math.log(t));
  const mx = xs.reduce((s, x) => s + x, 0) / xs.length,
    my = ys.reduce((s, y) => s + y, 0) / ys.length;
  return xs.reduce((s, x, i) => s + (x - mx) * (ys[i]! - my), 0) / xs.reduce((s, x) => s + (x - mx) ** 2, 0);
}

async function main() {
  const results: SizeResult[] = [];
  for (const { detail, runs } of SIZES) {
    const r = await inChild(detail, runs);
    results.push(r);
    const p = stats(r.prepMs),
      u = stats(r.unfoldMs),
      total = stats(r.prepMs.map((x, i) => x + r.unfoldMs[i]!));
    console.log(
      `${String(r.triangles).padStart(6)} triangles  check min ${f(p.min)} median ${f(p.median)} max ${f(p.max)} ms  ` +
        `unfold min ${f(u.min)} median ${f(u.median)} max ${f(u.max)} ms  ` +
        `total min ${f(total.min)} median ${f(total.median)} max ${f(total.max)} ms (CPU median ${f(stats(r.cpuMs).median)} ms)\n` +
        `        ${r.pieces} pieces, ${r.tabs} tabs, ${r.taped} taped edges, fold-back ${r.foldBackMm.toExponential(1)} mm, ` +
        `overlap ${r.overlapMm2.toExponential(1)} mm² (polygon-clipping), ` +
        `peak RSS ${r.peakMb.toFixed(0)} MB (${r.baseMb.toFixed(0)} MB before the mesh)`,
    );
  }
  const medians = (pick: (r: SizeResult, i: number) => number) =>
    results.map((r): [number, number] => [r.triangles, stats(r.prepMs.map((_, i) => pick(r, i))).median]);
  console.log(
    `fitted exponent: total time ∝ n^${exponent(medians((r, i) => r.prepMs[i]! + r.unfoldMs[i]!)).toFixed(2)}, ` +
      `unfold alone ∝ n^${exponent(medians((r, i) => r.unfoldMs[i]!)).toFixed(2)}, ` +
      `CPU time ∝ n^${exponent(medians((r, i) => r.cpuMs[i]!)).toFixed(2)} ` +
      `(n log n over this range fits about n^1.1; CPU time is the steadier figure on a shared machine)`,
  );
  const big = results[results.length - 1]!;
  const bigMs = stats(big.prepMs.map((x, i) => x + big.unfoldMs[i]!)).median;
  console.log(
    `target at ${TARGET.triangles} triangles: ${bigMs.toFixed(0)} ms (≤ ${TARGET.ms}), ` +
      `${big.peakMb.toFixed(0)} MB (≤ ${TARGET.mb}), overlap-free ${big.overlapMm2 < 1e-6 ? 'yes' : 'NO'}`,
  );
  await unfoldServerFigures();
}

if (process.argv[2] === '--size') {
  process.send!(runSize(Number(process.argv[3]), Number(process.argv[4])), () => process.disconnect());
} else {
  await main();
}
