/**
 * `npm run bench:unfold`: import and unfold subdivided icospheres of about 1,000, 10,000 and 50,000 triangles
 * (three.js IcosahedronGeometry written as binary STL) on A4 inside its margins at 160 g/m². Per size: parse
 * + check + merge time and unfold time as min / median / max of a few runs after a warm-up, pieces, taped
 * edges, peak resident memory; then the exponent of time against triangle count fitted by least squares on
 * log–log (n log n shows as a little above 1). Targets (issue 15): 50,000 triangles unfolded, overlap-free,
 * ≤ 3 s and ≤ 500 MB. Prints figures; fails nothing.
 */
import * as THREE from 'three';
import { meshPrepare, meshPreparedUnfold } from '../../src/lib/mesh/mesh-prepare';
import { geometrySoup, stlBytes } from '../lib/mesh/mesh-fixtures';

const SIZES = [
  { detail: 6, runs: 5 }, // 980 triangles
  { detail: 21, runs: 3 }, // 9,680
  { detail: 49, runs: 3 }, // 50,000
];

let peakRssMb = 0;
const sample = () => (peakRssMb = Math.max(peakRssMb, process.memoryUsage().rss / 2 ** 20));
const timer = setInterval(sample, 20);

const f = (ms: number) => ms.toFixed(0).padStart(6);
const stats = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return { min: s[0]!, median: s[Math.floor(s.length / 2)]!, max: s[s.length - 1]! };
};

const points: [number, number][] = [];
for (const { detail, runs } of SIZES) {
  const bytes = stlBytes(geometrySoup(new THREE.IcosahedronGeometry(100, detail)), true);
  const triangles = (bytes.length - 84) / 50;
  const prepTimes: number[] = [];
  const unfoldTimes: number[] = [];
  let summary = '';
  for (let r = 0; r <= runs; r++) {
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
    sample();
    if (r === 0) continue; // warm-up
    prepTimes.push(t1 - t0);
    unfoldTimes.push(t2 - t1);
    const s = u.summary;
    summary = `${String(s.pieceCount).padStart(5)} pieces  ${String(s.tabCount).padStart(6)} tabs  ${String(s.tapedEdgeCount).padStart(6)} taped`;
  }
  const p = stats(prepTimes),
    u = stats(unfoldTimes);
  const total = stats(prepTimes.map((x, i) => x + unfoldTimes[i]!));
  points.push([triangles, total.median]);
  console.log(
    `${String(triangles).padStart(6)} triangles  check min ${f(p.min)} median ${f(p.median)} max ${f(p.max)} ms  ` +
      `unfold min ${f(u.min)} median ${f(u.median)} max ${f(u.max)} ms  total median ${f(total.median)} ms  ${summary}  ` +
      `peak RSS so far ${peakRssMb.toFixed(0)} MB`,
  );
}
clearInterval(timer);
// Least-squares slope of log(time) on log(triangles).
const xs = points.map(([n]) => Math.log(n)),
  ys = points.map(([, t]) => Math.log(t));
const mx = xs.reduce((s, x) => s + x, 0) / xs.length,
  my = ys.reduce((s, y) => s + y, 0) / ys.length;
const slope = xs.reduce((s, x, i) => s + (x - mx) * (ys[i]! - my), 0) / xs.reduce((s, x) => s + (x - mx) ** 2, 0);
console.log(`fitted exponent: time ∝ n^${slope.toFixed(2)} (n log n over this range fits about n^1.1)`);
