/**
 * Sample data for the launch stack: the Skein demo stack (three probes on an adapter, as in
 * content/models/skein-stack.json) with invented masses and an invented fairing it fits, real size.
 */
import type { LaunchStackInput } from '../analysis/launch-stack';

export const LAUNCH_STACK_SAMPLE = {
  body: { kind: 'prism', sides: 6, across: 'flats', sizeM: 2.4, heightM: 0.9 },
  stack: { count: 3, ring: { heightM: 0.2, diameterM: 1.6 }, adapter: { heightM: 0.8, diameterM: 2 } },
  probeMassKg: 450,
  ringMassKg: 20,
  adapterMassKg: 120,
  fairing: { diameterM: 3.2, cylinderHeightM: 4.2, coneHeightM: 3, clearanceM: 0 },
} as const satisfies LaunchStackInput;
