/**
 * The 3D view's actions and the keys that trigger them while the view region has focus (never page-wide,
 * so screen-reader and browser shortcuts keep working everywhere else).
 */
export interface ViewActions {
  /** Orbit about the model: azimuthRad round the vertical axis, elevationRad up (+) or down (−). */
  rotate(azimuthRad: number, elevationRad: number): void;
  /** Move the camera toward the model (factor < 1) or away from it (factor > 1). */
  zoom(factor: number): void;
  reset(): void;
}

/** One keyboard step of orbit, radians (15°), and of zoom, as a distance factor. */
export const VIEW_ROTATE_STEP_RAD = Math.PI / 12;
export const VIEW_ZOOM_STEP = 1.25;

export type ViewCommand =
  { kind: 'rotate'; azimuthRad: number; elevationRad: number } | { kind: 'zoom'; factor: number } | { kind: 'reset' };

/** The command for a KeyboardEvent.key in the view region, or null when the key is not the view's. */
export function viewKeyCommand(key: string): ViewCommand | null {
  const s = VIEW_ROTATE_STEP_RAD;
  switch (key) {
    case 'ArrowLeft':
      return { kind: 'rotate', azimuthRad: -s, elevationRad: 0 };
    case 'ArrowRight':
      return { kind: 'rotate', azimuthRad: s, elevationRad: 0 };
    case 'ArrowUp':
      return { kind: 'rotate', azimuthRad: 0, elevationRad: s };
    case 'ArrowDown':
      return { kind: 'rotate', azimuthRad: 0, elevationRad: -s };
    case '+':
    case '=':
      return { kind: 'zoom', factor: 1 / VIEW_ZOOM_STEP };
    case '-':
    case '_':
      return { kind: 'zoom', factor: VIEW_ZOOM_STEP };
    case 'r':
    case 'R':
      return { kind: 'reset' };
    default:
      return null;
  }
}

/** Runs a command on the view's actions. */
export function viewCommandRun(actions: ViewActions, c: ViewCommand): void {
  if (c.kind === 'rotate') actions.rotate(c.azimuthRad, c.elevationRad);
  else if (c.kind === 'zoom') actions.zoom(c.factor);
  else actions.reset();
}
