import { lazy, Suspense, useEffect, useState } from 'react';
import { FORMATION_EVENT, formationLast, type FormationDetail } from '../../lib/preview/formation-event';
import { numberFormat } from '../../lib/tools/number-format';
import webglAvailable from './webgl-available';

// three.js and react-three-fiber live in this chunk, fetched only once WebGL is known to work.
const FormationCanvas = lazy(() => import('./FormationCanvas'));

const vector = (v: readonly number[]) => `(${v.map((x) => numberFormat(x, 3)).join(', ')})`;

/**
 * The four-point tool's 3D view: the sensors as balls joined by the formation's edges, the table as a grid
 * and the gradient as an arrow from the centre. Listens for the tool's formation event; until the first
 * run it shows nothing but how to start. The list under the view says the same in words.
 */
export default function FormationView() {
  const [formation, setFormation] = useState<FormationDetail | null>(null);
  const [webgl, setWebgl] = useState<boolean | null>(null);
  useEffect(() => {
    setWebgl(webglAvailable());
    setFormation(formationLast());
    const on = (e: Event) => setFormation((e as CustomEvent<FormationDetail>).detail);
    window.addEventListener(FORMATION_EVENT, on);
    return () => window.removeEventListener(FORMATION_EVENT, on);
  }, []);
  const g = formation?.gradient;
  return (
    <figure className="card" data-testid="formation-view">
      <h2 className="text-xl font-bold">The formation in 3D</h2>
      <div className="mt-3 h-80 overflow-hidden rounded-lg border border-ink/15 bg-paper">
        {!formation || formation.points.length === 0 ? (
          <p className="p-4 text-ink-soft">Run the tool to see your sensors here. Drag to turn the view.</p>
        ) : webgl === false ? (
          <p className="p-4 text-ink-soft">
            This browser cannot show the 3D view (WebGL is off); the list below says the same.
          </p>
        ) : webgl ? (
          <Suspense fallback={<p className="p-4 text-ink-soft">Loading the 3D view…</p>}>
            <FormationCanvas formation={formation} />
          </Suspense>
        ) : (
          <p className="p-4 text-ink-soft">Starting the 3D view…</p>
        )}
      </div>
      {formation && formation.points.length > 0 && (
        <figcaption className="mt-2 text-sm">
          <ul className="flex flex-wrap gap-x-4">
            {formation.points.map((p) => (
              <li key={p.label}>
                <span className="font-semibold">{p.label}</span> at {vector(p.positionCm)} cm
              </li>
            ))}
          </ul>
          <p className="mt-1" data-testid="formation-arrow">
            {g
              ? `The arrow starts at the centre ${vector(g.fromCm)} cm and points where the reading grows fastest, ${numberFormat(Math.hypot(...g.perCm), 3)} ${g.unit} per cm.`
              : 'No arrow: the tool has not found a gradient for these sensors. Sensors lying in one plane, like three points always do, cannot see how the field changes across that plane.'}
          </p>
        </figcaption>
      )}
    </figure>
  );
}
