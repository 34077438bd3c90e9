/**
 * The two numbers every kit is made from, each checked by one schema: the scale 1:N and the paper weight in
 * g/m². The engine (model-patterns.ts), the kit request, the builder's settings and the scale tool's form
 * all use these, so a limit or its message changes in one place. Imports zod and paper.ts only, so the
 * builder island can use them without the engine.
 */
import { z } from 'zod';
import { PAPER_GSM_MAX, PAPER_GSM_MIN } from './paper';

/** Largest scale denominator accepted (1:100 000): beyond it every real spacecraft is dust on paper. */
export const SCALE_DENOMINATOR_MAX = 100_000;

/** The N of a 1:N scale: the kit is 1/N of the real spacecraft. */
export const ScaleDenominatorSchema = z
  .number({ invalid_type_error: 'the scale must be a number N of 1:N' })
  .finite('the scale must be a finite number')
  .min(1, 'the scale must be 1:1 or smaller, e.g. 20 for 1:20')
  .max(SCALE_DENOMINATOR_MAX, `the scale must be at most 1:${SCALE_DENOMINATOR_MAX}`);

/** Paper weight in g/m², which sets tab depths and overlap strips (paper.ts); default PAPER_GSM_DEFAULT. */
export const PaperGsmSchema = z
  .number({ invalid_type_error: 'the paper weight must be a number of g/m²' })
  .finite('the paper weight must be a finite number')
  .min(PAPER_GSM_MIN, `the paper weight must be at least ${PAPER_GSM_MIN} g/m²`)
  .max(PAPER_GSM_MAX, `the paper weight must be at most ${PAPER_GSM_MAX} g/m²`);
