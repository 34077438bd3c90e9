/**
 * Every data tool's analysis by name, so the worker pool (src/lib/work) can run one off the request's thread:
 * a task carries the tool's name and its checked input (structured-clone data), the worker calls the function.
 */
import type { AccelerationUnitSource } from './acceleration-units';
import { cleanroomClassify, type CleanroomInput } from './cleanroom';
import { deploymentAnalyse, type DeploymentInput } from './deployment';
import { equilibriumTemperature, type EquilibriumTemperatureInput } from './equilibrium-temperature';
import { fourPointGradient, type FourPointInput } from './four-point';
import { interferenceRank, type InterferenceInput } from './interference';
import { launchStackAnalyse, type LaunchStackInput } from './launch-stack';
import { magneticFieldFit, type MagneticInput } from './magnetic';
import { orbitEclipse, type OrbitEclipseInput } from './orbit-eclipse';
import { psdProfileGrms, type PsdProfileInput } from './psd-profile';
import { thermalAnalyse, type ThermalInput } from './thermal';
import { vibrationAnalyse, type VibrationInput } from './vibration';

/** One analysis call: the tool and its input (the vibration tool also says where its unit came from). */
export type AnalysisCall =
  | { tool: 'cleanroom'; input: CleanroomInput }
  | { tool: 'deployment'; input: DeploymentInput }
  | { tool: 'equilibrium-temperature'; input: EquilibriumTemperatureInput }
  | { tool: 'four-point'; input: FourPointInput }
  | { tool: 'interference'; input: InterferenceInput }
  | { tool: 'launch-stack'; input: LaunchStackInput }
  | { tool: 'magnetic'; input: MagneticInput }
  | { tool: 'orbit-eclipse'; input: OrbitEclipseInput }
  | { tool: 'psd-profile'; input: PsdProfileInput }
  | { tool: 'thermal'; input: ThermalInput }
  | { tool: 'vibration'; input: VibrationInput; unitSource?: AccelerationUnitSource };

/** Runs the call's analysis; throws what the analysis throws (InputError for data it cannot use). */
export function analysisRun(call: AnalysisCall): unknown {
  switch (call.tool) {
    case 'cleanroom':
      return cleanroomClassify(call.input);
    case 'deployment':
      return deploymentAnalyse(call.input);
    case 'equilibrium-temperature':
      return equilibriumTemperature(call.input);
    case 'four-point':
      return fourPointGradient(call.input);
    case 'interference':
      return interferenceRank(call.input);
    case 'launch-stack':
      return launchStackAnalyse(call.input);
    case 'magnetic':
      return magneticFieldFit(call.input);
    case 'orbit-eclipse':
      return orbitEclipse(call.input);
    case 'psd-profile':
      return psdProfileGrms(call.input);
    case 'thermal':
      return thermalAnalyse(call.input);
    case 'vibration':
      return vibrationAnalyse(call.input, call.unitSource);
  }
}
