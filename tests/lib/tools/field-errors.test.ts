import { describe, expect, it } from 'vitest';
import { fieldErrorsPlace } from '../../../src/lib/tools/field-errors';

describe('fieldErrorsPlace', () => {
  const map = { 'readings.0.distanceCm': '0.distanceCm', readings: 'table', backgroundUT: 'backgroundUT' };

  it('places an error on the input its path maps to', () => {
    const r = fieldErrorsPlace({ 'readings.0.distanceCm': ['must be positive'] }, map);
    expect(r).toEqual({ placed: { '0.distanceCm': 'must be positive' }, unplaced: [] });
  });

  it('falls back to the nearest mapped parent path', () => {
    const r = fieldErrorsPlace({ 'readings.7.fieldUT': ['expected number'] }, map);
    expect(r.placed).toEqual({ table: 'expected number' });
  });

  it('lists errors that no input can show, with their path', () => {
    const r = fieldErrorsPlace({ units: ['bad'], '': ['whole request'] }, map);
    expect(r).toEqual({ placed: {}, unplaced: ['units: bad', 'whole request'] });
  });

  it('keeps the first message when two paths land on one input', () => {
    const r = fieldErrorsPlace({ 'readings.3': ['first'], 'readings.4': ['second'] }, map);
    expect(r.placed).toEqual({ table: 'first' });
  });
});
