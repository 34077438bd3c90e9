/**
 * The unfold through the running app (part of `npm run bench:unfold`): a signed-in teacher uploads the 50,000
 * triangle icosphere (POST /api/models/imports: streamed, checked in the worker pool) and asks for its kit
 * summary at 1:1 on A4 (an unfold in the worker pool) over and over, while autocannon asks GET /api/health on 4
 * connections. Issue 15's bound: /api/health p99 under 50 ms while the import and unfold run. Figures per round:
 * upload time, summary time, and /api/health p99 quiet and during the work.
 */
import * as THREE from 'three';
import { userSessionCookie } from '../api/auth-helpers';
import { geometrySoup, stlBytes } from '../lib/mesh/mesh-fixtures';
import { BENCH_ROUNDS, benchAppStart, figure, latenciesUnderLoad, percentile } from './bench-harness';

const HEALTH_SECONDS = 6;
const HEALTH_CONNECTIONS = 4;

export async function unfoldServerFigures(): Promise<void> {
  const bench = await benchAppStart({ name: 'unfold' });
  const { app, knex } = bench;
  try {
    const teacher = (await knex('users').where({ role: 'teacher' }).orderBy('email').first('id')) as { id: string };
    const cookie = await userSessionCookie(knex, teacher.id);
    const headers = { cookie, origin: app.url };
    const bytes = stlBytes(geometrySoup(new THREE.IcosahedronGeometry(100, 49)), true);
    const ids: string[] = [];
    // Through the API, so each stored file goes with its row.
    bench.atCleanup(() =>
      Promise.all(ids.map((id) => fetch(`${app.url}/api/models/imports/${id}`, { method: 'DELETE', headers }))),
    );
    const health = () =>
      latenciesUnderLoad(`${app.url}/api/health`, { connections: HEALTH_CONNECTIONS, duration: HEALTH_SECONDS });
    await health(); // warm-up
    const fig = { quiet: [] as number[], busy: [] as number[], upload: [] as number[], summary: [] as number[] };
    console.log(`\nthrough the app: ${(bytes.length - 84) / 50} triangles, ${BENCH_ROUNDS} rounds`);
    for (let round = 0; round < BENCH_ROUNDS; round++) {
      fig.quiet.push(percentile((await health()).latencies, 99));
      let running = true;
      const work = (async () => {
        while (running) {
          const form = new FormData();
          form.append('file', new Blob([new Uint8Array(bytes)]), 'ball.stl');
          const t0 = performance.now();
          const up = await fetch(`${app.url}/api/models/imports`, { method: 'POST', body: form, headers });
          if (up.status !== 201) throw new Error(`upload answered ${up.status}: ${await up.text()}`);
          fig.upload.push(performance.now() - t0);
          const id = ((await up.json()) as { model: { id: string } }).model.id;
          ids.push(id);
          await fetch(`${app.url}/api/models/imports/${id}`, {
            method: 'PATCH',
            headers: { ...headers, 'content-type': 'application/json' },
            body: JSON.stringify({ unit: 'mm' }),
          });
          const t1 = performance.now();
          const sum = await fetch(`${app.url}/api/models/imports/${id}/summary`, {
            method: 'POST',
            headers: { ...headers, 'content-type': 'application/json' },
            body: JSON.stringify({ scaleDenominator: 1, sheetSizeId: 'a4', paperGsm: 160 }),
          });
          if (sum.status !== 200) throw new Error(`summary answered ${sum.status}: ${await sum.text()}`);
          fig.summary.push(performance.now() - t1);
        }
      })();
      // The health load starts with the first upload and ends before the last unfold does.
      const busy = await health();
      running = false;
      await work;
      fig.busy.push(percentile(busy.latencies, 99));
    }
    figure('upload + check of 50,000 triangles', fig.upload, 'ms');
    figure('kit summary (unfold at 1:1 on A4)', fig.summary, 'ms');
    figure('GET /api/health p99, quiet', fig.quiet, 'ms');
    figure('GET /api/health p99, during upload and unfold', fig.busy, 'ms', { op: '≤', value: 50 });
  } finally {
    await bench.cleanup();
  }
}
