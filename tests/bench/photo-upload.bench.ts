/**
 * `npm run bench:photos` — the upload part of the issue-11 review bench alone (tests/bench/photo-upload-figures.ts
 * says what it measures), on the demo database, on loopback. `npm run bench:review` runs the same figures after
 * the review queue's. Ports: PORT (app, 4321); the project's PostgreSQL.
 */
import { benchAppStart } from './bench-harness';
import { PHOTO_BENCH_ENV, photoUploadFigures } from './photo-upload-figures';

const bench = await benchAppStart({ name: 'photos', env: PHOTO_BENCH_ENV });
try {
  const school = await bench.knex('schools').orderBy('name').first('id');
  await photoUploadFigures(bench, school.id as string);
} finally {
  await bench.cleanup();
}
