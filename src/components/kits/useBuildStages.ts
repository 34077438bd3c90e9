import { useMemo, useState } from 'react';
import type { BuildListener } from './kit-queries';
import type { KitStageDone } from '../../lib/kit/kit-stages';

/** The stages the server has finished for the build in flight, whether it was cancelled, and its listener. */
export function useBuildStages() {
  const [stagesDone, setStagesDone] = useState<KitStageDone[]>([]);
  const [cancelled, setCancelled] = useState(false);
  const listener = useMemo<BuildListener>(
    () => ({
      begin: () => {
        setStagesDone([]);
        setCancelled(false);
      },
      stage: (stage, ms) => setStagesDone((d) => [...d, { stage, ms }]),
    }),
    [],
  );
  return { stagesDone, cancelled, listener, markCancelled: () => setCancelled(true) };
}
