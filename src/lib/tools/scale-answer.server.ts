/**
 * Server adapter of the public scale page (/tools/scale): the solver's explanation for one set of form values,
 * searched once on the worker pool and then kept by those values, so an anonymous GET (the page without a query
 * shows the default worked example) never searches again for inputs it has answered before.
 */
import { InputError } from '../errors';
import { KitCache } from '../kit/kit-cache.server';
import { workRun } from '../work/work-pool.server';
import type { WorkTask } from '../work/work-tasks';
import type { ScaleExplanation } from './scale-explain';

export type ScaleAnswer = { answer: ScaleExplanation; solverError: null } | { answer: null; solverError: string };

/** Distinct form values kept; one answer is a few kB. */
export const SCALE_ANSWERS_KEPT = 512;

const answers = new KitCache<ScaleAnswer>(() => 1, SCALE_ANSWERS_KEPT);

/** The explanation for `task`, or the solver's refusal in words; `key` names the form values it came from. */
export function scaleAnswer(key: string, task: Extract<WorkTask, { kind: 'scale-explain' }>): Promise<ScaleAnswer> {
  return answers.get(key, async () => {
    try {
      return { answer: (await workRun(task)) as ScaleExplanation, solverError: null };
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      return { answer: null, solverError: err.message };
    }
  });
}
