import { describe, expect, it } from 'vitest';
import { launchStackFormRequest, launchStackSampleForm } from '../../../src/lib/tools/launch-stack-form';
import { LAUNCH_STACK_SAMPLE } from '../../../src/lib/tools/launch-stack-sample';

describe('launchStackFormRequest', () => {
  it('turns the sample form back into the sample request', () => {
    expect(launchStackFormRequest(launchStackSampleForm()).input).toEqual(LAUNCH_STACK_SAMPLE);
  });

  it('reads a paper model typed in cm and g as m and kg (SI: 1 m = 100 cm, 1 kg = 1000 g)', () => {
    const form = launchStackSampleForm();
    const values = Object.fromEntries(
      Object.entries(form.values).map(([k, v]) => [
        k,
        k === 'body.sides' || k === 'stack.count' ? v : String(Number(v) * (k.endsWith('Kg') ? 1000 : 100)),
      ]),
    );
    const input = launchStackFormRequest({ ...form, lengthUnit: 'cm', massUnit: 'g', values }).input!;
    expect(input.body).toEqual(LAUNCH_STACK_SAMPLE.body);
    expect(input.fairing.cylinderHeightM).toBeCloseTo(4.2, 12);
    expect(input.probeMassKg).toBeCloseTo(450, 12);
  });

  it('names the blank and the unreadable fields by their request path', () => {
    const form = launchStackSampleForm();
    const r = launchStackFormRequest({
      ...form,
      values: { ...form.values, 'fairing.diameterM': '', probeMassKg: 'lots' },
    });
    expect(r.input).toBeNull();
    expect(Object.keys(r.errors).sort()).toEqual(['fairing.diameterM', 'probeMassKg']);
  });
});
