/**
 * The deploy-test tool: a team deploys its boom or panel again and again and records each trial (fully,
 * partly or not deployed; time to deploy; final length). Per design: the rate of full deployments with
 * its 95 % Wilson score and Clopper–Pearson intervals, how many trials would narrow the interval to ±10
 * points, the running success rate trial by trial, and a sentence a class can read. Two designs: their
 * difference with Newcombe's hybrid score interval. The statistics are in binomial-interval.ts.
 */
import { z } from 'zod';
import {
  binomialClopperPearsonInterval,
  binomialTrialsForHalfWidth,
  binomialWilsonInterval,
  proportionDifferenceNewcombe,
  type ProportionDifference,
  type ProportionInterval,
} from './binomial-interval';

/** Largest JSON deployment request, bytes (2 designs × 1000 trials of ~70 bytes fit with room). */
export const DEPLOYMENT_JSON_MAX_BYTES = 200_000;
/** Fewest trials a design needs: one trial says nothing about a rate. */
export const DEPLOYMENT_MIN_TRIALS = 2;
/** Most trials a design may have. */
export const DEPLOYMENT_MAX_TRIALS = 1_000;
/** Designs compared at once. */
export const DEPLOYMENT_MAX_DESIGNS = 2;
/** Half-width the "how many more trials" answer aims for: ±10 percentage points. */
export const DEPLOYMENT_TARGET_HALF_WIDTH = 0.1;
/** What a trial can end as. */
export const DEPLOYMENT_OUTCOMES = ['full', 'partial', 'none'] as const;
export type DeploymentOutcome = (typeof DEPLOYMENT_OUTCOMES)[number];

export const DeploymentTrialSchema = z
  .object({
    /** Deployed fully (a success), partly, or not at all. */
    outcome: z.enum(DEPLOYMENT_OUTCOMES, {
      errorMap: () => ({ message: 'an outcome is "full", "partial" or "none"' }),
    }),
    /** Seconds from release to the boom coming to rest; optional. */
    timeS: z.number().finite().min(0).max(3600).optional(),
    /** Length of the boom (or opening of the panel) at rest, cm; optional. */
    finalLengthCm: z.number().finite().min(0).max(10_000).optional(),
  })
  .strict();

export const DeploymentCountsSchema = z
  .object({
    /** Number of trials run. */
    trials: z.number().int('trials are a whole number').min(0).max(DEPLOYMENT_MAX_TRIALS),
    /** How many of them deployed fully. */
    fullyDeployed: z.number().int('a whole number of trials').min(0),
    /** How many deployed partly; optional. */
    partlyDeployed: z.number().int('a whole number of trials').min(0).optional(),
  })
  .strict();

export const DeploymentDesignSchema = z
  .object({
    /** The design's name, e.g. "Spring boom". */
    label: z.string().trim().min(1, 'name the design').max(60, 'keep the name under 60 characters'),
    /** Each trial, in the order run; or give `counts` instead. */
    trials: z
      .array(DeploymentTrialSchema)
      .max(DEPLOYMENT_MAX_TRIALS, `at most ${DEPLOYMENT_MAX_TRIALS} trials`)
      .optional(),
    /** Totals only, when the trials were not recorded one by one. */
    counts: DeploymentCountsSchema.optional(),
  })
  .strict()
  .superRefine((d, ctx) => {
    if ((d.trials === undefined) === (d.counts === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['trials'], message: 'give either the trials one by one or the counts' });
      return;
    }
    const n = d.trials?.length ?? d.counts!.trials;
    if (n < DEPLOYMENT_MIN_TRIALS) {
      ctx.addIssue({
        code: 'custom',
        path: d.trials ? ['trials'] : ['counts', 'trials'],
        message: `${d.label || 'this design'} has ${n} trial${n === 1 ? '' : 's'}; a rate needs at least ${DEPLOYMENT_MIN_TRIALS}`,
      });
    }
    if (d.counts) {
      const { trials, fullyDeployed, partlyDeployed = 0 } = d.counts;
      if (fullyDeployed > trials) {
        ctx.addIssue({
          code: 'custom',
          path: ['counts', 'fullyDeployed'],
          message: `${fullyDeployed} full deployments is more than the ${trials} trials run`,
        });
      } else if (fullyDeployed + partlyDeployed > trials) {
        ctx.addIssue({
          code: 'custom',
          path: ['counts', 'partlyDeployed'],
          message: `${fullyDeployed} full and ${partlyDeployed} partial deployments add up to more than the ${trials} trials run`,
        });
      }
    }
  });

export const DeploymentInputSchema = z
  .object({
    designs: z
      .array(DeploymentDesignSchema)
      .min(1, 'give at least one design')
      .max(DEPLOYMENT_MAX_DESIGNS, `compare at most ${DEPLOYMENT_MAX_DESIGNS} designs at once`),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.designs.length === 2 && v.designs[0]!.label === v.designs[1]!.label) {
      ctx.addIssue({ code: 'custom', path: ['designs', 1, 'label'], message: 'give the two designs different names' });
    }
  });
export type DeploymentInput = z.infer<typeof DeploymentInputSchema>;
export type DeploymentDesign = z.infer<typeof DeploymentDesignSchema>;

/** Smallest, middle and largest of a measured quantity over the trials that recorded it. */
export interface DeploymentSpread {
  count: number;
  min: number;
  median: number;
  max: number;
}

export interface DeploymentDesignResult {
  label: string;
  trials: number;
  fullyDeployed: number;
  /** null when only counts were given without a partial count. */
  partlyDeployed: number | null;
  notDeployed: number | null;
  /** Fully deployed / trials, 0…1. */
  successRate: number;
  wilson: ProportionInterval;
  clopperPearson: ProportionInterval;
  /** Trials in all for a ±10-point interval (textbook formula at the planning rate), and how many more. */
  trialsForTarget: number;
  moreTrialsForTarget: number;
  /** The rate the sample size was planned at: the observed rate, or the Wilson bound nearest ½ for 0 or n of n. */
  planningRate: number;
  /** [trial number, running success rate in %] after each trial; [] when only counts were given. */
  runningRatePct: [number, number][];
  /** The Wilson interval after each trial, in %: [trial, lower, upper]; [] when only counts were given. */
  runningWilsonPct: [number, number, number][];
  /** Time to deploy of the full deployments, s; null when none recorded a time. */
  deployTimeS: DeploymentSpread | null;
  /** Final length over all trials that recorded one, cm; null when none did. */
  finalLengthCm: DeploymentSpread | null;
  /** The result in one sentence for a class. */
  summary: string;
}

export interface DeploymentResult {
  designs: DeploymentDesignResult[];
  /** First design's rate minus the second's, with Newcombe's interval; null with one design. */
  comparison: (ProportionDifference & { summary: string }) | null;
  warnings: string[];
}

const pct = (fraction: number) => Math.round(fraction * 100);

function spread(values: number[]): DeploymentSpread | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  const median = s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
  return { count: s.length, min: s[0]!, median, max: s.at(-1)! };
}

/** "17 of 20 deployed fully: 85 %, and with this many trials the true rate is likely between 64 % and 95 %." */
export function deploymentSummary(fully: number, trials: number, wilson: ProportionInterval): string {
  return `${fully} of ${trials} deployed fully: ${pct(fully / trials)} %, and with this many trials the true rate is likely between ${pct(wilson.lower)} % and ${pct(wilson.upper)} %.`;
}

function designAnalyse(d: DeploymentDesign): DeploymentDesignResult {
  const trials = d.trials ?? [];
  const n = d.trials ? trials.length : d.counts!.trials;
  const fully = d.trials ? trials.filter((t) => t.outcome === 'full').length : d.counts!.fullyDeployed;
  const partly = d.trials ? trials.filter((t) => t.outcome === 'partial').length : (d.counts!.partlyDeployed ?? null);
  const wilson = binomialWilsonInterval(fully, n);
  const rate = fully / n;
  // At 0 or n of n the observed rate would ask for no trials at all; plan at the plausible rate nearest ½.
  const planningRate = fully === 0 ? wilson.upper : fully === n ? wilson.lower : rate;
  const trialsForTarget = binomialTrialsForHalfWidth(planningRate, DEPLOYMENT_TARGET_HALF_WIDTH);
  const runningRatePct: [number, number][] = [];
  const runningWilsonPct: [number, number, number][] = [];
  let sofar = 0;
  trials.forEach((t, i) => {
    if (t.outcome === 'full') sofar++;
    const w = binomialWilsonInterval(sofar, i + 1);
    runningRatePct.push([i + 1, (100 * sofar) / (i + 1)]);
    runningWilsonPct.push([i + 1, 100 * w.lower, 100 * w.upper]);
  });
  const times = trials.flatMap((t) => (t.outcome === 'full' && t.timeS !== undefined ? [t.timeS] : []));
  const lengths = trials.flatMap((t) => (t.finalLengthCm === undefined ? [] : [t.finalLengthCm]));
  return {
    label: d.label,
    trials: n,
    fullyDeployed: fully,
    partlyDeployed: partly,
    notDeployed: partly === null ? null : n - fully - partly,
    successRate: rate,
    wilson,
    clopperPearson: binomialClopperPearsonInterval(fully, n),
    trialsForTarget,
    moreTrialsForTarget: Math.max(0, trialsForTarget - n),
    planningRate,
    runningRatePct,
    runningWilsonPct,
    deployTimeS: spread(times),
    finalLengthCm: spread(lengths),
    summary: deploymentSummary(fully, n, wilson),
  };
}

function comparisonSummary(a: DeploymentDesignResult, b: DeploymentDesignResult, diff: ProportionDifference): string {
  const points = (f: number) => `${f > 0 ? '+' : f < 0 ? '−' : ''}${Math.abs(pct(f))}`;
  const head = `${a.label} deployed fully ${pct(a.successRate)} % of the time and ${b.label} ${pct(b.successRate)} %: a difference of ${points(diff.difference)} points, likely between ${points(diff.lower)} and ${points(diff.upper)} points.`;
  if (diff.lower > 0) return `${head} ${a.label} is likely the more reliable design.`;
  if (diff.upper < 0) return `${head} ${b.label} is likely the more reliable design.`;
  return `${head} The interval includes 0, so these trials cannot yet tell the two designs apart.`;
}

/** Analyses one or two designs' deployment trials (see DeploymentInputSchema); pure, never throws on valid input. */
export function deploymentAnalyse(input: DeploymentInput): DeploymentResult {
  const designs = input.designs.map(designAnalyse);
  const warnings: string[] = [];
  for (const d of designs) {
    if (d.trials < 10) {
      warnings.push(
        `${d.label}: with ${d.trials} trials the interval is wide (${pct(d.wilson.lower)}–${pct(d.wilson.upper)} %); run more trials before drawing a conclusion.`,
      );
    }
  }
  let comparison: DeploymentResult['comparison'] = null;
  if (designs.length === 2) {
    const [a, b] = designs as [DeploymentDesignResult, DeploymentDesignResult];
    const diff = proportionDifferenceNewcombe(a.fullyDeployed, a.trials, b.fullyDeployed, b.trials);
    comparison = { ...diff, summary: comparisonSummary(a, b, diff) };
  }
  return { designs, comparison, warnings };
}
