/**
 * Running a tool from its table: problems found while reading the cells stop the run and show at once;
 * otherwise the request goes to the API, and the API's field errors are placed next to their inputs through
 * the request's path map. Both kinds land in one `errors` record keyed like the inputs.
 */
import { useMemo, useState } from 'react';
import { fieldErrorsPlace } from '../../lib/tools/field-errors';
import type { CellErrors, TableRequest } from '../../lib/tools/table-cells';
import { useAnalysis, type AnalysisBody, type AnalysisTool } from './useAnalysis';

/** The mutation of `tool` with the run's errors placed by input key. */
export function useToolRun<R>(tool: AnalysisTool) {
  const mutation = useAnalysis<R>(tool);
  const [clientErrors, setClientErrors] = useState<CellErrors>({});
  const [inputOfPath, setInputOfPath] = useState<Record<string, string>>({});
  const api = useMemo(() => fieldErrorsPlace(mutation.error?.fields ?? {}, inputOfPath), [mutation.error, inputOfPath]);
  const run = <T>(req: TableRequest<T>, body: (input: T) => AnalysisBody) => {
    setInputOfPath(req.inputOfPath);
    setClientErrors(req.errors);
    if (req.input === null) {
      mutation.reset();
      return;
    }
    mutation.mutate(body(req.input));
  };
  const errors: CellErrors = { ...api.placed, ...clientErrors };
  const problemCount = Object.keys(clientErrors).length;
  return { mutation, errors, unplaced: api.unplaced, run, problemCount };
}
