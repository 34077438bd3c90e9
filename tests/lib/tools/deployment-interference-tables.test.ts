import { describe, expect, it } from 'vitest';
import { DeploymentInputSchema, deploymentAnalyse } from '../../../src/lib/analysis/deployment';
import { InterferenceInputSchema, interferenceRank } from '../../../src/lib/analysis/interference';
import { deploymentSample } from '../../../src/lib/tools/deployment-sample';
import { deploymentOutcomeRead, deploymentTableRequest } from '../../../src/lib/tools/deployment-table';
import {
  INTERFERENCE_SAMPLE_DEVICES,
  INTERFERENCE_SAMPLE_THRESHOLD_UT,
  INTERFERENCE_SAMPLE_BACKGROUND_UT,
  interferenceSampleListening,
  interferenceSampleReadings,
} from '../../../src/lib/tools/interference-sample';
import { interferenceTableRequest } from '../../../src/lib/tools/interference-table';

const row = (design: string, outcome: string, timeS = '', finalLengthCm = '') => ({
  design,
  outcome,
  timeS,
  finalLengthCm,
});

describe('deploymentTableRequest', () => {
  it('reads outcome words in any case and groups rows by design in order', () => {
    expect(['Full', 'yes', 'PARTLY', 'p', 'no', 'None'].map(deploymentOutcomeRead)).toEqual([
      'full',
      'full',
      'partial',
      'partial',
      'none',
      'none',
    ]);
    const req = deploymentTableRequest([
      row('A', 'full', '1.5'),
      row('B', 'no'),
      row('', '', '', ''),
      row('A', 'partly', '', '20'),
    ]);
    expect(req.errors).toEqual({});
    expect(req.input).toEqual({
      designs: [
        {
          label: 'A',
          trials: [
            { outcome: 'full', timeS: 1.5 },
            { outcome: 'partial', finalLengthCm: 20 },
          ],
        },
        { label: 'B', trials: [{ outcome: 'none' }] },
      ],
    });
    expect(req.inputOfPath['designs.0.trials.1.outcome']).toBe('3.outcome');
  });

  it('puts problems next to their cells and refuses a third design', () => {
    const bad = deploymentTableRequest([row('A', 'maybe'), row('', 'full', 'x')]);
    expect(bad.input).toBeNull();
    expect(bad.errors).toEqual({
      '0.outcome': 'write full, partial or none',
      '1.design': 'name the design',
      '1.timeS': '“x” is not a number',
    });
    const three = deploymentTableRequest([row('A', 'full'), row('B', 'full'), row('C', 'full')]);
    expect(three.errors.table).toMatch(/3 designs .* at most 2/);
  });

  it('turns the sample into 17 of 20 and 13 of 20 full deployments', () => {
    const rows = deploymentSample().map((t) => row(t.design, t.outcome, String(t.timeS), String(t.finalLengthCm)));
    const r = deploymentAnalyse(DeploymentInputSchema.parse(deploymentTableRequest(rows).input));
    expect(r.designs.map((d) => [d.label, d.fullyDeployed, d.trials])).toEqual([
      ['Spring boom', 17, 20],
      ['Elastic boom', 13, 20],
    ]);
  });
});

describe('interferenceTableRequest', () => {
  it('ranks the sample devices by dipole moment, each crossing near the hand-worked distance', () => {
    const rows = interferenceSampleReadings().map((x) => ({
      device: x.device,
      distanceCm: String(x.distanceCm),
      fieldUT: String(x.fieldUT),
    }));
    const req = interferenceTableRequest(rows, {
      receiver: 'magnetometer',
      backgroundUT: String(INTERFERENCE_SAMPLE_BACKGROUND_UT),
      thresholdUT: String(INTERFERENCE_SAMPLE_THRESHOLD_UT),
    });
    const r = interferenceRank(InterferenceInputSchema.parse(req.input));
    const byMoment = [...INTERFERENCE_SAMPLE_DEVICES].sort((a, b) => b.momentAm2 - a.momentAm2);
    expect(r.ranking.map((d) => d.label)).toEqual(byMoment.map((d) => d.label));
    for (const d of r.ranking) {
      const m = INTERFERENCE_SAMPLE_DEVICES.find((x) => x.label === d.label)!.momentAm2;
      // Griffiths §5.4.3, on axis: B = (μ0/4π)·2m/r³ = 1 µT at r = (2e-7·m/1e-6)^(1/3) m. 10 % allows the noise.
      const rCm = 100 * ((2e-7 * m) / 1e-6) ** (1 / 3);
      expect(Math.abs(d.fit!.thresholdDistanceCm! / rCm - 1)).toBeLessThan(0.1);
    }
  });

  it('reads listening tries for the radio and ranks by the farthest', () => {
    const rows = interferenceSampleListening().map((x) => ({ device: x.device, noiseGoneCm: String(x.noiseGoneCm) }));
    const req = interferenceTableRequest(rows, { receiver: 'am-radio', backgroundUT: '', thresholdUT: '' });
    const r = interferenceRank(InterferenceInputSchema.parse(req.input));
    expect(r.ranking.map((d) => [d.label, d.keepOutCm])).toEqual([
      ['Phone charger', 65],
      ['Desk fan', 45],
      ['Toy motor', 30],
    ]);
  });

  it('asks for a device name and numbers, cell by cell', () => {
    const req = interferenceTableRequest([{ device: '', distanceCm: '5', fieldUT: 'lots' }], {
      receiver: 'magnetometer',
      backgroundUT: '0',
      thresholdUT: '',
    });
    expect(req.input).toBeNull();
    expect(req.errors).toEqual({ '0.device': 'name the device', '0.fieldUT': '“lots” is not a number' });
  });
});
