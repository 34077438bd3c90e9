/**
 * The data-tool endpoints against the running test server (KW_TEST_BASE_URL, set by the test harness):
 * good data answers 200 with a result and a saved result; bad data answers a JSON 400 or 413 of the shared
 * shape { error: { code, message, fields? } } quickly, never a hang or an HTML page.
 */
import http from 'node:http';
import { describe, expect, it } from 'vitest';

const BASE = process.env.KW_TEST_BASE_URL!;
const FS = 100;

interface Answer {
  status: number;
  // Response bodies are read loosely; each test checks the fields it needs.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  body: any;
}

async function post(path: string, body: string, contentType: string): Promise<Answer> {
  const res = await fetch(`${BASE}/api/analysis/${path}`, {
    method: 'POST',
    headers: { 'content-type': contentType },
    body,
    signal: AbortSignal.timeout(20_000),
  });
  expect(res.headers.get('content-type')).toMatch(/application\/json/);
  return { status: res.status, body: await res.json() };
}

const postJson = (path: string, data: unknown) => post(path, JSON.stringify(data), 'application/json');
const postCsv = (path: string, csv: string, query = '') => post(`${path}${query}`, csv, 'text/csv');

function expectError(a: Answer, status: number, code: string, message?: RegExp): void {
  expect(a.status).toBe(status);
  expect(a.body.error.code).toBe(code);
  expect(typeof a.body.error.message).toBe('string');
  if (message) expect(a.body.error.message).toMatch(message);
}

function shakeCsv(n: number, f0 = 12.5): string {
  const rows = Array.from(
    { length: n },
    (_, i) => `${(i / FS).toFixed(2)},${(0.4 * Math.sin((2 * Math.PI * f0 * i) / FS)).toFixed(5)},0.01,1`,
  );
  return ['time_s,x_g,y_g,z_g', ...rows].join('\n');
}

/** Streams `bytes` of CSV-looking text to the endpoint and resolves with the answer, even if the server stops reading. */
function postHuge(path: string, bytes: number, declareLength: boolean): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const url = new URL(`${BASE}/api/analysis/${path}`);
    const headers: Record<string, string | number> = { 'content-type': 'text/csv' };
    if (declareLength) headers['content-length'] = bytes;
    let answered = false;
    const req = http.request(url, { method: 'POST', headers }, (res) => {
      answered = true;
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => (text += c));
      res.on('end', () => {
        try {
          resolve({ status: res.statusCode ?? 0, body: JSON.parse(text) });
        } catch (err) {
          reject(err);
        }
      });
    });
    req.setTimeout(30_000, () => req.destroy(new Error('the server did not answer within 30 s')));
    req.on('error', (err) => {
      if (!answered) reject(err);
    });
    const chunk = Buffer.from('0.01,0.5,0.0,1.0\n'.repeat(61_681)); // ≈ 1 MB
    let sent = 0;
    const pump = () => {
      while (!answered && sent < bytes) {
        const piece = chunk.subarray(0, Math.min(chunk.length, bytes - sent));
        sent += piece.length;
        if (!req.write(piece)) return void req.once('drain', pump);
      }
      req.end();
    };
    pump();
  });
}

describe('POST /api/analysis/vibration', () => {
  it('analyses a CSV record and returns the dominant frequency and a saved result', async () => {
    const a = await postCsv('vibration', shakeCsv(3000), '?units=g');
    expect(a.status).toBe(200);
    expect(a.body.result.sampleRateHz).toBeCloseTo(FS, 3);
    expect(Math.abs(a.body.result.dominant[0].frequencyHz - 12.5)).toBeLessThanOrEqual(a.body.result.psd.resolutionHz);
    expect(a.body.savedResult.tool).toBe('vibration');
  });

  it('analyses a JSON record', async () => {
    const timeS = Array.from({ length: 1000 }, (_, i) => i / FS);
    const a = await postJson('vibration', {
      timeS,
      x: timeS.map((t) => Math.sin(2 * Math.PI * 5 * t)),
      y: timeS.map(() => 0),
      z: timeS.map(() => 9.8),
    });
    expect(a.status).toBe(200);
    expect(a.body.result.units).toEqual({ input: 'm/s2', source: 'gravity' });
  });

  it('answers 400 for text in a number column, naming the row', async () => {
    const lines = shakeCsv(500).split('\n');
    lines[7] = '0.06,loud,0,1';
    expectError(await postCsv('vibration', lines.join('\n')), 400, 'invalid_input', /Row 8.*"loud" is not a number/);
  });

  it('answers 400 for a single row, saying how many readings would work', async () => {
    expectError(await postCsv('vibration', 'time,x,y,z\n0,0,0,1\n'), 400, 'invalid_input', /at least 256/);
  });

  it('answers 400 when time goes backwards', async () => {
    const lines = shakeCsv(500).split('\n');
    lines[100] = '0.5,0,0,1';
    expectError(await postCsv('vibration', lines.join('\n')), 400, 'invalid_input', /backwards/);
  });

  it('answers 400 for NaN in CSV and for NaN smuggled into JSON', async () => {
    const lines = shakeCsv(500).split('\n');
    lines[3] = '0.02,NaN,0,1';
    expectError(await postCsv('vibration', lines.join('\n')), 400, 'invalid_input', /not a finite number/);
    const a = await post('vibration', '{"timeS":[0,0.01],"x":[NaN,1],"y":[0,0],"z":[0,0]}', 'application/json');
    expectError(a, 400, 'invalid_input', /JSON/);
    const b = await postJson('vibration', { timeS: [0, 0.01], x: ['NaN', 1], y: [0, 0], z: [0, 0] });
    expectError(b, 400, 'invalid_input');
    expect(Object.keys(b.body.error.fields)).toContain('x.0');
  });

  it('answers 400 for uneven sampling', async () => {
    const lines = shakeCsv(600).split('\n');
    for (let i = 300; i < 320; i += 2) lines[i] = lines[i]!.replace(/^[^,]+/, (t) => (Number(t) + 0.004).toFixed(3));
    expectError(await postCsv('vibration', lines.join('\n')), 400, 'invalid_input', /unevenly sampled/);
  });

  it('answers 400 for a wrong content type and for malformed JSON', async () => {
    expectError(
      await post('vibration', '<record/>', 'application/xml'),
      400,
      'invalid_input',
      /application\/json.*text\/csv/,
    );
    expectError(await post('vibration', '{"timeS": [0,', 'application/json'), 400, 'invalid_input', /not valid JSON/);
  });

  it('answers 413 for a 50 MB upload with a declared length', async () => {
    const a = await postHuge('vibration', 50_000_000, true);
    expectError(a, 413, 'too_large', /16 MB/);
  });

  it('answers 413 for a 50 MB upload streamed without a declared length', async () => {
    const a = await postHuge('vibration', 50_000_000, false);
    expectError(a, 413, 'too_large');
  });

  it('answers 413 for more rows than the tool reads, even under the byte cap', async () => {
    expectError(
      await postCsv('vibration', 'time,x,y,z\n' + '0,0,0,1\n'.repeat(400_001)),
      413,
      'too_large',
      /400,000 data rows/,
    );
  });
});

describe('POST /api/analysis/thermal', () => {
  const timeS = Array.from({ length: 40 }, (_, i) => i * 30);
  it('fits a run and returns τ with its uncertainty', async () => {
    // Incropera et al., ch. 5: T = T∞ + (T0 − T∞)·e^(−t/τ), noise-free, τ = 400 s.
    const a = await postJson('thermal', {
      runs: [{ label: 'cooler', timeS, temperatureC: timeS.map((t) => 6 + 14 * Math.exp(-t / 400)) }],
    });
    expect(a.status).toBe(200);
    expect(a.body.result.runs[0].fit.timeConstantS).toBeCloseTo(400, 2);
    expect(a.body.savedResult.plot.kind).toBe('line');
  });

  it('reads CSV and refuses text and time going backwards', async () => {
    expect((await postCsv('thermal', 'time (min),lamp\n0,20\n1,24\n2,27\n3,29\n4,30\n5,30.5\n')).status).toBe(200);
    expectError(await postCsv('thermal', 'time,lamp\n0,20\n1,hot\n'), 400, 'invalid_input', /not a number/);
    expectError(
      await postJson('thermal', { runs: [{ label: 'a', timeS: [0, 60, 30], temperatureC: [20, 21, 22] }] }),
      400,
      'invalid_input',
      /backwards/,
    );
  });
});

describe('POST /api/analysis/cleanroom', () => {
  it('classifies a room and states the sampling locations its area needs', async () => {
    // ISO 14644-1:2015 Table 1: Class 7 allows 352 000 /m³ at 0.5 µm; Table A.1: ≤ 52 m² → 10 locations.
    const locations = Array.from({ length: 10 }, (_, i) => ({
      label: `P${i + 1}`,
      samples: [{ volume: 1, volumeUnit: 'm3', counts: [300_000, 50_000] }],
    }));
    const a = await postJson('cleanroom', { floorAreaM2: 50, sizesUm: [0.5, 1], locations });
    expect(a.status).toBe(200);
    expect(a.body.result.isoClass).toBe(7);
    expect(a.body.result.locationsRequired).toBe(10);
  });

  it('answers 400 for a size not in the standard', async () => {
    const a = await postJson('cleanroom', {
      floorAreaM2: 5,
      sizesUm: [0.7],
      locations: [{ label: 'A', samples: [{ volume: 1, volumeUnit: 'L', counts: [1] }] }],
    });
    expectError(a, 400, 'invalid_input');
    expect(a.body.error.fields).toBeTruthy();
  });
});

describe('POST /api/analysis/magnetic', () => {
  it('gives an exponent of −3 for dipole readings', async () => {
    // Griffiths §5.4.3: on-axis dipole field ∝ 1/r³.
    const readings = [2, 3, 4, 6, 8, 10].map((d) => ({ distanceCm: d, fieldUT: 1000 / d ** 3 }));
    const a = await postJson('magnetic', { readings });
    expect(a.status).toBe(200);
    expect(a.body.result.exponent).toBeCloseTo(-3, 9);
  });

  it('answers 400 for too few readings', async () => {
    expectError(
      await postJson('magnetic', { readings: [{ distanceCm: 2, fieldUT: 10 }] }),
      400,
      'invalid_input',
      /at least 3/,
    );
  });
});

describe('POST /api/analysis/psd-profile, orbit-eclipse, equilibrium-temperature', () => {
  it('gives the GEVS qualification Grms', async () => {
    // GSFC-STD-7000A Table 2.4-3, components ≤ 22.7 kg: 14.1 Grms (log-log segment integration).
    const points = [
      { frequencyHz: 20, psdG2PerHz: 0.026 },
      { frequencyHz: 50, psdG2PerHz: 0.16 },
      { frequencyHz: 800, psdG2PerHz: 0.16 },
      { frequencyHz: 2000, psdG2PerHz: 0.026 },
    ];
    const a = await postJson('psd-profile', { points });
    expect(a.status).toBe(200);
    expect(Math.abs(a.body.result.grms - 14.1)).toBeLessThanOrEqual(0.05);
  });

  it('gives the eclipse at 400 km', async () => {
    // Wertz & Larson, SMAD ch. 5, WGS 84: period 92.56 min, eclipse 36.1 min.
    const a = await postJson('orbit-eclipse', { altitudeKm: 400 });
    expect(a.status).toBe(200);
    expect(Math.abs(a.body.result.eclipseMin - 36.1)).toBeLessThan(0.05);
  });

  it('gives 278.3 K for a black sphere at 1 AU and refuses an emissivity above 1', async () => {
    // (S/(4σ))^¼, S = 1360.8 W/m² (Kopp & Lean 2011), σ CODATA 2018.
    const a = await postJson('equilibrium-temperature', { absorptivity: 1, emissivity: 1 });
    expect(Math.abs(a.body.result.temperatureK - 278.3)).toBeLessThan(0.05);
    expectError(await postJson('equilibrium-temperature', { absorptivity: 1, emissivity: 2 }), 400, 'invalid_input');
  });

  it('answers 413 for a JSON body over the small cap', async () => {
    expectError(await postJson('orbit-eclipse', { altitudeKm: 400, padding: 'x'.repeat(20_000) }), 413, 'too_large');
  });
});

describe('POST /api/analysis/deployment', () => {
  const trials = (full: number, n: number) =>
    Array.from({ length: n }, (_, i) => ({ outcome: i < full ? 'full' : 'none', timeS: 1.5, finalLengthCm: 30 }));

  it('answers the rate, both intervals, the plain-words sentence and a saved result', async () => {
    const a = await postJson('deployment', { designs: [{ label: 'Spring boom', trials: trials(17, 20) }] });
    expect(a.status).toBe(200);
    const d = a.body.result.designs[0];
    // Newcombe 1998a method 3 (Wilson) for 17/20, by its closed form: 0.6396–0.9476.
    expect(d.wilson.lower).toBeCloseTo(0.6396, 4);
    expect(d.wilson.upper).toBeCloseTo(0.9476, 4);
    expect(d.clopperPearson.lower).toBeLessThan(d.wilson.lower);
    expect(d.summary).toMatch(/^17 of 20 deployed fully: 85 %, .* between 64 % and 95 %\.$/);
    expect(a.body.savedResult.tool).toBe('deployment');
    expect(a.body.savedResult.plot.series[0].points).toHaveLength(20);
  });

  it('compares two designs (Newcombe 1998b, Table II (a): 56/70 − 48/80 → 0.0524 to 0.3339)', async () => {
    const a = await postJson('deployment', {
      designs: [
        { label: 'A', counts: { trials: 70, fullyDeployed: 56 } },
        { label: 'B', counts: { trials: 80, fullyDeployed: 48 } },
      ],
    });
    expect(a.status).toBe(200);
    expect(a.body.result.comparison.lower).toBeCloseTo(0.0524, 4);
    expect(a.body.result.comparison.upper).toBeCloseTo(0.3339, 4);
  });

  it('answers 400 for fewer than 2 trials, more successes than trials and NaN, naming the field', async () => {
    const one = await postJson('deployment', { designs: [{ label: 'A', trials: trials(1, 1) }] });
    expectError(one, 400, 'invalid_input', /at least 2/);
    expect(one.body.error.fields['designs.0.trials']).toBeTruthy();
    const over = await postJson('deployment', { designs: [{ label: 'A', counts: { trials: 15, fullyDeployed: 17 } }] });
    expectError(over, 400, 'invalid_input', /more than the 15 trials/);
    expect(over.body.error.fields['designs.0.counts.fullyDeployed']).toBeTruthy();
    const nan = await post(
      'deployment',
      '{"designs":[{"label":"A","trials":[{"outcome":"full","timeS":NaN},{"outcome":"full"}]}]}',
      'application/json',
    );
    expectError(nan, 400, 'invalid_input', /not valid JSON/);
  });

  it('answers 413 for a body over its cap', async () => {
    const a = await postJson('deployment', {
      designs: [{ label: 'A', trials: trials(2, 2) }],
      padding: 'x'.repeat(250_000),
    });
    expectError(a, 413, 'too_large');
  });
});

describe('POST /api/analysis/interference', () => {
  it('ranks devices by keep-out distance', async () => {
    // Griffiths §5.4.3: dipole readings B ∝ 1/r³; the stronger source must be kept farther away.
    const readings = (k: number) => [5, 10, 20, 40].map((d) => ({ distanceCm: d, fieldUT: k / d ** 3 }));
    const a = await postJson('interference', {
      receiver: 'magnetometer',
      thresholdUT: 1,
      devices: [
        { label: 'Fan', readings: readings(2_000) },
        { label: 'Charger', readings: readings(20_000) },
      ],
    });
    expect(a.status).toBe(200);
    expect(a.body.result.ranking.map((d: { label: string }) => d.label)).toEqual(['Charger', 'Fan']);
    // r* = (k/B*)^(1/3): 27.14 cm for k = 20 000 µT·cm³, B* = 1 µT.
    expect(a.body.result.ranking[0].fit.thresholdDistanceCm).toBeCloseTo(20_000 ** (1 / 3), 6);
    expect(a.body.savedResult.tool).toBe('interference');
  });

  it('answers 400 naming the device whose readings cannot be fitted, and for NaN', async () => {
    const a = await postJson('interference', {
      receiver: 'magnetometer',
      devices: [{ label: 'Lamp', readings: [{ distanceCm: 5, fieldUT: 9 }] }],
    });
    expectError(a, 400, 'invalid_input', /^Lamp: /);
    expect(a.body.error.fields['devices.0.readings']).toBeTruthy();
    expectError(
      await post(
        'interference',
        '{"receiver":"am-radio","devices":[{"label":"A","noiseGoneCm":[NaN]}]}',
        'application/json',
      ),
      400,
      'invalid_input',
    );
  });

  it('answers 413 for a body over its cap', async () => {
    const a = await postJson('interference', { receiver: 'am-radio', devices: [], padding: 'x'.repeat(250_000) });
    expectError(a, 413, 'too_large');
  });
});
