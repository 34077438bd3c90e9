/**
 * The launch stack: identical probes on an adapter, a separation ring under each → the stack's height, its
 * centre of mass and whether it fits a fairing (a cylinder and a cone), with what to change when it does not.
 * Sizes in m or cm and masses in kg or g, so a class can type its paper model's measurements.
 */
import { useState } from 'react';
import type { LaunchStackInput, LaunchStackResult } from '../../lib/analysis/launch-stack';
import { STACK_PROBES_MAX } from '../../lib/geometry/model-schema';
import {
  LAUNCH_STACK_FORM_GROUPS,
  LAUNCH_STACK_LENGTH_PER_M,
  LAUNCH_STACK_MASS_PER_KG,
  launchStackFormRequest,
  launchStackSampleForm,
  type LaunchStackBodyKind,
  type LaunchStackForm,
} from '../../lib/tools/launch-stack-form';
import { numberFormat } from '../../lib/tools/number-format';
import DownloadResultButton from './DownloadResultButton';
import LaunchStackSideView from './LaunchStackSideView';
import NumberField from './NumberField';
import Plot from './Plot';
import ResultList from './ResultList';
import RunBar from './RunBar';
import SampleDataButton from './SampleDataButton';
import SelectField from './SelectField';
import WarningList from './WarningList';
import { useToolRun } from './useToolRun';

const LABELS: Record<string, { label: string; hint?: string; mass?: boolean; count?: boolean }> = {
  'body.sides': { label: 'Sides', count: true },
  'body.sizeM': { label: 'Width of the body' },
  'body.widthM': { label: 'Width' },
  'body.depthM': { label: 'Depth' },
  'body.diameterM': { label: 'Diameter' },
  'body.heightM': { label: 'Height of one probe' },
  'stack.count': { label: 'Probes in the stack', count: true, hint: `1 to ${STACK_PROBES_MAX}.` },
  probeMassKg: { label: 'Mass of one probe', mass: true },
  probeCentreOfMassM: { label: 'Its centre of mass above its base', hint: 'Leave blank for half its height.' },
  'stack.ring.heightM': { label: 'Ring height' },
  'stack.ring.diameterM': { label: 'Ring diameter' },
  ringMassKg: { label: 'Ring mass', mass: true },
  'stack.adapter.heightM': { label: 'Adapter height' },
  'stack.adapter.diameterM': { label: 'Adapter diameter' },
  adapterMassKg: { label: 'Adapter mass', mass: true },
  'fairing.diameterM': { label: 'Fairing diameter', hint: 'Inside the cylinder.' },
  'fairing.cylinderHeightM': { label: 'Cylinder height', hint: 'From the adapter base to where the cone starts.' },
  'fairing.coneHeightM': { label: 'Cone height' },
  'fairing.clearanceM': { label: 'Gap to keep', hint: 'Room to leave between stack and wall; blank for none.' },
};
const empty = (): LaunchStackForm => ({
  lengthUnit: 'm',
  massUnit: 'kg',
  bodyKind: 'prism',
  across: 'flats',
  values: {},
});

/** The launch-stack tool island. */
export default function LaunchStackTool() {
  const [form, setForm] = useState<LaunchStackForm>(empty);
  const [sent, setSent] = useState<LaunchStackInput | null>(null);
  const { mutation, errors, unplaced, run } = useToolRun<LaunchStackResult>('launch-stack');
  const r = mutation.data?.result;
  const perM = LAUNCH_STACK_LENGTH_PER_M[form.lengthUnit];
  const len = (m: number) => numberFormat(m * perM, 3);
  const set = (path: string, value: string) => setForm((f) => ({ ...f, values: { ...f.values, [path]: value } }));
  const submit = () => {
    const req = launchStackFormRequest(form);
    if (req.input) setSent(req.input);
    run(req, (json) => ({ json }));
  };

  return (
    <div className="grid gap-6">
      <section className="card no-print" aria-labelledby="stack-input">
        <h2 id="stack-input" className="text-xl font-bold">
          Your stack
        </h2>
        <div className="mt-3">
          <SampleDataButton
            onLoad={() => setForm(launchStackSampleForm())}
            description="the Skein demo stack at real size: three 450 kg probes on a 120 kg adapter, and a fairing it fits (invented)."
          />
        </div>
        <div className="mt-4 flex flex-wrap gap-6">
          <SelectField
            label="Sizes in"
            name="lengthUnit"
            value={form.lengthUnit}
            options={[
              { value: 'm', label: 'metres (the real spacecraft)' },
              { value: 'cm', label: 'centimetres (the paper model)' },
            ]}
            onChange={(v) => setForm((f) => ({ ...f, lengthUnit: v as LaunchStackForm['lengthUnit'] }))}
          />
          <SelectField
            label="Masses in"
            name="massUnit"
            value={form.massUnit}
            options={[
              { value: 'kg', label: 'kilograms' },
              { value: 'g', label: 'grams' },
            ]}
            onChange={(v) => setForm((f) => ({ ...f, massUnit: v as LaunchStackForm['massUnit'] }))}
          />
          <SelectField
            label="Probe shape"
            name="bodyKind"
            value={form.bodyKind}
            options={[
              { value: 'prism', label: 'Prism (hexagon, octagon …)' },
              { value: 'box', label: 'Box' },
              { value: 'cylinder', label: 'Cylinder' },
            ]}
            onChange={(v) => setForm((f) => ({ ...f, bodyKind: v as LaunchStackBodyKind }))}
          />
          {form.bodyKind === 'prism' && (
            <SelectField
              label="Width measured"
              name="body.across"
              value={form.across}
              options={[
                { value: 'flats', label: 'between opposite flat sides' },
                { value: 'corners', label: 'between opposite corners' },
              ]}
              onChange={(v) => setForm((f) => ({ ...f, across: v as LaunchStackForm['across'] }))}
            />
          )}
        </div>
        {LAUNCH_STACK_FORM_GROUPS.map((g) => (
          <fieldset key={g.title} className="mt-4">
            <legend className="font-bold">{g.title}</legend>
            <div className="mt-2 flex flex-wrap gap-6">
              {g.fields(form.bodyKind).map((path) => {
                const d = LABELS[path]!;
                return (
                  <NumberField
                    key={path}
                    name={path}
                    label={d.label}
                    unit={d.count ? undefined : d.mass ? form.massUnit : form.lengthUnit}
                    hint={d.hint}
                    value={form.values[path] ?? ''}
                    onChange={(v) => set(path, v)}
                    error={errors[path]}
                  />
                );
              })}
            </div>
          </fieldset>
        ))}
        <RunBar
          label="Check the stack"
          onRun={submit}
          mutation={mutation}
          unplaced={unplaced}
          emptyText="No result yet: type the sizes and masses or load the sample, then check the stack."
        />
      </section>
      {r && mutation.data && sent && (
        <>
          <ResultList
            title="Result"
            items={[
              {
                label: 'Fits the fairing',
                value: r.fits ? 'Yes' : 'No',
                note: r.fits
                  ? `Closest to the wall: ${len(r.minMarginM)} ${form.lengthUnit} to spare.`
                  : `Sticks out by up to ${len(-r.minMarginM)} ${form.lengthUnit}.`,
                testId: 'stack-fits',
              },
              { label: 'Stack height', value: len(r.heightM), unit: form.lengthUnit, testId: 'stack-height' },
              {
                label: 'Centre of mass',
                value: len(r.centreOfMassM),
                unit: `${form.lengthUnit} above the adapter base`,
                note: `${Math.round(100 * r.centreOfMassFraction)} % of the way up the stack.`,
                testId: 'stack-centre-of-mass',
              },
              {
                label: 'Total mass',
                value: numberFormat(r.totalMassKg * LAUNCH_STACK_MASS_PER_KG[form.massUnit], 4),
                unit: form.massUnit,
              },
              {
                label: 'Most probes that fit',
                value: String(r.maxProbesThatFit),
                note: 'On this adapter, in this fairing.',
              },
            ]}
          />
          <WarningList warnings={r.advice} />
          <LaunchStackSideView input={sent} result={r} />
          <Plot plot={mutation.data.savedResult.plot} />
          <DownloadResultButton savedResult={mutation.data.savedResult} />
        </>
      )}
    </div>
  );
}
