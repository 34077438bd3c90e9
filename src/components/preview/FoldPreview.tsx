import { lazy, Suspense, useEffect, useId, useMemo, useRef, useState } from 'react';
import { assemblySteps, type AssemblyRod } from '../../lib/preview/assembly-steps';
import type { FoldPreviewProps } from './fold-preview-props';
import type { ViewActions } from '../../lib/preview/view-keys';
import useFoldProgress from './useFoldProgress';
import webglAvailable from './webgl-available';
import FoldSlider from './FoldSlider';
import ViewButtons from './ViewButtons';
import AssemblyStepList from './AssemblyStepList';
import BoomScaleView from './BoomScaleView';
import StillFallback from './StillFallback';

// three.js and react-three-fiber live in this chunk, fetched only once WebGL is known to work.
const FoldCanvas = lazy(() => import('./FoldCanvas'));
// One empty list for every render, so the steps are not recomputed when a page passes no rods.
const NO_RODS: AssemblyRod[] = [];

/**
 * The 3D fold-along preview island: the model folding from flat sheet to part, assembly steps with their
 * tab numbers, and the booms at scale. Renders its text on the server; the 3D view starts after mount.
 */
export default function FoldPreview({
  title,
  scaleDenominator,
  pieces,
  boomScale,
  rods = NO_RODS,
  initialFoldPercent = 100,
}: FoldPreviewProps) {
  // The same steps as the PDF's instructions: the pieces, then one step per rod (instructionsSteps).
  const steps = useMemo(() => assemblySteps(pieces, rods), [pieces, rods]);
  const progress = useFoldProgress(steps.length, initialFoldPercent);
  const [webgl, setWebgl] = useState<boolean | null>(null);
  useEffect(() => setWebgl(webglAvailable()), []);
  const actionsRef = useRef<ViewActions | null>(null);
  const hintId = useId();
  const step = steps[progress.stepIndex];

  return (
    <div className="grid gap-6 lg:grid-cols-[3fr_2fr]" data-testid="fold-preview">
      <div className="flex flex-col gap-3">
        <div className="h-[28rem] overflow-hidden rounded-lg border border-ink/15 bg-paper">
          {webgl === false ? (
            <StillFallback pieces={pieces} rods={rods} step={step} />
          ) : webgl ? (
            <Suspense fallback={<p className="p-4 text-ink-soft">Loading the 3D view…</p>}>
              <FoldCanvas
                pieces={pieces}
                rods={rods}
                foldPercent={progress.foldPercent}
                foldWholeKit={progress.foldWholeKit}
                step={step}
                actionsRef={actionsRef}
                label={`3D view of the ${title} kit at 1:${scaleDenominator}`}
                hintId={hintId}
              />
            </Suspense>
          ) : (
            <p className="p-4 text-ink-soft">Starting the 3D view…</p>
          )}
        </div>
        {webgl !== false && (
          <>
            <FoldSlider
              foldPercent={progress.foldPercent}
              onChange={progress.setFoldPercent}
              foldWholeKit={progress.foldWholeKit}
              onFoldWholeKitChange={progress.setFoldWholeKit}
              disabled={!webgl}
            />
            <ViewButtons actionsRef={actionsRef} hintId={hintId} />
          </>
        )}
      </div>
      <AssemblyStepList
        steps={steps}
        stepIndex={progress.stepIndex}
        onPrevious={progress.stepPrevious}
        onNext={progress.stepNext}
        onGo={progress.stepGo}
      />
      <div className="lg:col-span-2">
        <h2 className="mb-2 text-xl font-bold">The booms at scale</h2>
        <BoomScaleView boomScale={boomScale} />
      </div>
    </div>
  );
}
