import { useState } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { ApiError } from '../../lib/http/client';
import { kitPreviewQueryOptions, scaleSolveQueryOptions } from './kit-queries';
import type { KitBuilderProps } from '../../lib/kit/kit-builder-props';
import KitBuilderForm from './KitBuilderForm';

/**
 * The kit builder island: a query client seeded with the first sheets and the solver's answer the page read
 * on the server, around the builder's form and results (KitBuilderForm).
 */
export default function KitBuilder(props: KitBuilderProps) {
  const [client] = useState(() => {
    const c = new QueryClient({
      defaultOptions: {
        queries: {
          refetchOnWindowFocus: false,
          retry: (count, err) => !(err instanceof ApiError && err.status > 0 && err.status < 500) && count < 2,
        },
      },
    });
    if (props.initialPreview) c.setQueryData(kitPreviewQueryOptions(props.initial).queryKey, props.initialPreview);
    if (props.initialSolve) {
      const { modelId, importId, sheetSizeId, paperGsm, units, venue, gradeBand } = props.initial;
      c.setQueryData(
        scaleSolveQueryOptions({ modelId, importId, sheetSizeId, paperGsm, units, venue, gradeBand }).queryKey,
        props.initialSolve,
      );
    }
    return c;
  });
  return (
    <QueryClientProvider client={client}>
      <KitBuilderForm {...props} />
    </QueryClientProvider>
  );
}
