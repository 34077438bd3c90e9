/**
 * The interference tool's table turned into an InterferenceInput request. With a magnetometer each row is
 * one reading (device, distance, field); with an AM radio each row is one try (device, distance where the
 * noise stopped). Rows with the same device name are grouped as that device's readings or tries.
 */
import type { InterferenceReceiver, InterferenceRequest } from '../analysis/interference';
import { formFieldNumber, tableCellKey, tableNumbers, type TableRequest, type TableRow } from './table-cells';

/** Number columns per receiver. */
export const INTERFERENCE_TABLE_KEYS: Record<InterferenceReceiver, readonly string[]> = {
  magnetometer: ['distanceCm', 'fieldUT'],
  'am-radio': ['noiseGoneCm'],
};

export interface InterferenceFields {
  receiver: InterferenceReceiver;
  backgroundUT: string;
  thresholdUT: string;
}

/** Builds the request from rows and the form's fields; blank background and threshold take the defaults. */
export function interferenceTableRequest(
  rows: readonly TableRow[],
  f: InterferenceFields,
): TableRequest<InterferenceRequest> {
  const keys = INTERFERENCE_TABLE_KEYS[f.receiver];
  const read = tableNumbers(rows, keys);
  const errors = { ...read.errors };
  const inputOfPath: Record<string, string> = {
    devices: 'table',
    backgroundUT: 'backgroundUT',
    thresholdUT: 'thresholdUT',
  };
  const magnetometer = f.receiver === 'magnetometer';
  const backgroundUT = magnetometer ? formFieldNumber(f.backgroundUT, 'backgroundUT', errors, false) : undefined;
  const thresholdUT = magnetometer ? formFieldNumber(f.thresholdUT, 'thresholdUT', errors, false) : undefined;
  const devices: { label: string; readings: { distanceCm: number; fieldUT: number }[]; noiseGoneCm: number[] }[] = [];
  read.rowIndexes.forEach((r, i) => {
    const label = (rows[r]!.device ?? '').trim();
    if (label === '') errors[tableCellKey(r, 'device')] = 'name the device';
    let d = devices.findIndex((x) => x.label === label);
    if (d < 0) {
      d = devices.push({ label, readings: [], noiseGoneCm: [] }) - 1;
      inputOfPath[`devices.${d}.label`] = tableCellKey(r, 'device');
      inputOfPath[`devices.${d}.readings`] = tableCellKey(r, 'device');
      inputOfPath[`devices.${d}.noiseGoneCm`] = tableCellKey(r, 'device');
    }
    const device = devices[d]!;
    const values = read.values[i]!;
    if (magnetometer) {
      const k = device.readings.length;
      inputOfPath[`devices.${d}.readings.${k}.distanceCm`] = tableCellKey(r, 'distanceCm');
      inputOfPath[`devices.${d}.readings.${k}.fieldUT`] = tableCellKey(r, 'fieldUT');
      device.readings.push({ distanceCm: values[0] ?? 0, fieldUT: values[1] ?? 0 });
    } else {
      inputOfPath[`devices.${d}.noiseGoneCm.${device.noiseGoneCm.length}`] = tableCellKey(r, 'noiseGoneCm');
      device.noiseGoneCm.push(values[0] ?? 0);
    }
  });
  if (Object.keys(errors).length > 0) return { input: null, errors, inputOfPath };
  return {
    input: {
      receiver: f.receiver,
      ...(backgroundUT === undefined ? {} : { backgroundUT }),
      ...(thresholdUT === undefined ? {} : { thresholdUT }),
      devices: devices.map((d) =>
        magnetometer ? { label: d.label, readings: d.readings } : { label: d.label, noiseGoneCm: d.noiseGoneCm },
      ),
    },
    errors,
    inputOfPath,
  };
}
