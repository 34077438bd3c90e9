import { describe, expect, it } from 'vitest';
import { fieldErrorsPlace } from '../../../src/lib/tools/field-errors';
import { magneticTableRequest } from '../../../src/lib/tools/magnetic-table';
import { thermalTableRequest } from '../../../src/lib/tools/thermal-table';
import { vibrationTableRequest } from '../../../src/lib/tools/vibration-table';

describe('magneticTableRequest', () => {
  it('maps each reading’s request path back to its table cell, skipping blank rows', () => {
    const rows = [
      { distanceCm: '4', fieldUT: '100' },
      { distanceCm: '', fieldUT: '' },
      { distanceCm: '8', fieldUT: '12' },
    ];
    const req = magneticTableRequest(rows, { backgroundUT: '', thresholdUT: '' });
    expect(req.input!.readings).toEqual([
      { distanceCm: 4, fieldUT: 100 },
      { distanceCm: 8, fieldUT: 12 },
    ]);
    const placed = fieldErrorsPlace({ 'readings.1.distanceCm': ['must be positive'] }, req.inputOfPath).placed;
    expect(placed).toEqual({ '2.distanceCm': 'must be positive' });
  });

  it('stops on text in a number cell and names that cell', () => {
    const req = magneticTableRequest([{ distanceCm: 'ten', fieldUT: '5' }], { backgroundUT: '0', thresholdUT: '' });
    expect(req.input).toBeNull();
    expect(req.errors).toEqual({ '0.distanceCm': '“ten” is not a number' });
  });
});

describe('thermalTableRequest', () => {
  it('leaves a blank temperature out of its own run only', () => {
    const rows = [
      { timeS: '0', run0: '30', run1: '31' },
      { timeS: '30', run0: '', run1: '29' },
      { timeS: '60', run0: '26', run1: '27' },
    ];
    const req = thermalTableRequest(rows, ['bare', '']);
    expect(req.input!.runs).toEqual([
      { label: 'bare', timeS: [0, 60], temperatureC: [30, 26] },
      { label: 'run 2', timeS: [0, 30, 60], temperatureC: [31, 29, 27] },
    ]);
    expect(req.inputOfPath['runs.0.temperatureC.1']).toBe('2.run0');
  });
});

describe('vibrationTableRequest', () => {
  it('writes typed rows as CSV with a header, and maps CSV row numbers to cells', () => {
    const req = vibrationTableRequest([
      { timeS: '0', x: '0.1', y: '0', z: '1' },
      { timeS: '0.01', x: '0.2', y: '0', z: '1' },
    ]);
    expect(req.input).toBe('time_s,x,y,z\n0,0.1,0,1\n0.01,0.2,0,1\n');
    // The header is CSV row 1, so table row 2 (index 1) is CSV row 3.
    expect(req.inputOfPath['row 3']).toBe('1.timeS');
  });
});
