import type { RefObject } from 'react';
import { VIEW_ROTATE_STEP_RAD, VIEW_ZOOM_STEP, type ViewActions } from '../../lib/preview/view-keys';

interface Props {
  actionsRef: RefObject<ViewActions | null>;
  /** id given to the key hint, which the view region names as its description. */
  hintId: string;
}

const s = VIEW_ROTATE_STEP_RAD;

/** Buttons for every view move, and the visible list of the view's keys. */
export default function ViewButtons({ actionsRef, hintId }: Props) {
  const run = (f: (a: ViewActions) => void) => () => {
    if (actionsRef.current) f(actionsRef.current);
  };
  const buttons: [string, () => void][] = [
    ['Turn left', run((a) => a.rotate(-s, 0))],
    ['Turn right', run((a) => a.rotate(s, 0))],
    ['Tilt up', run((a) => a.rotate(0, s))],
    ['Tilt down', run((a) => a.rotate(0, -s))],
    ['Zoom in', run((a) => a.zoom(1 / VIEW_ZOOM_STEP))],
    ['Zoom out', run((a) => a.zoom(VIEW_ZOOM_STEP))],
    ['Reset view', run((a) => a.reset())],
  ];
  return (
    <div className="mt-2">
      <div className="flex flex-wrap gap-1" role="group" aria-label="View">
        {buttons.map(([name, onClick]) => (
          <button key={name} type="button" className="btn-secondary px-2 py-1 text-sm" onClick={onClick}>
            {name}
          </button>
        ))}
      </div>
      <p id={hintId} className="mt-1 text-sm text-ink-soft">
        Drag to turn, scroll or pinch to zoom. With the 3D view focused: <kbd>←</kbd> <kbd>→</kbd> turn, <kbd>↑</kbd>{' '}
        <kbd>↓</kbd> tilt, <kbd>+</kbd> <kbd>−</kbd> zoom, <kbd>R</kbd> resets the view.
      </p>
    </div>
  );
}
