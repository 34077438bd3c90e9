import { describe, expect, test, vi } from 'vitest';
import {
  VIEW_ROTATE_STEP_RAD,
  VIEW_ZOOM_STEP,
  viewCommandRun,
  viewKeyCommand,
} from '../../../src/lib/preview/view-keys';

describe('viewKeyCommand', () => {
  test('turns with the left and right arrows and tilts with up and down', () => {
    expect(viewKeyCommand('ArrowLeft')).toEqual({ kind: 'rotate', azimuthRad: -VIEW_ROTATE_STEP_RAD, elevationRad: 0 });
    expect(viewKeyCommand('ArrowRight')).toEqual({ kind: 'rotate', azimuthRad: VIEW_ROTATE_STEP_RAD, elevationRad: 0 });
    expect(viewKeyCommand('ArrowUp')).toEqual({ kind: 'rotate', azimuthRad: 0, elevationRad: VIEW_ROTATE_STEP_RAD });
    expect(viewKeyCommand('ArrowDown')).toEqual({ kind: 'rotate', azimuthRad: 0, elevationRad: -VIEW_ROTATE_STEP_RAD });
  });

  test('zooms in with + or = and out with - or _, by reciprocal factors', () => {
    for (const k of ['+', '=']) expect(viewKeyCommand(k)).toEqual({ kind: 'zoom', factor: 1 / VIEW_ZOOM_STEP });
    for (const k of ['-', '_']) expect(viewKeyCommand(k)).toEqual({ kind: 'zoom', factor: VIEW_ZOOM_STEP });
  });

  test('resets with R in either case', () => {
    expect(viewKeyCommand('r')).toEqual({ kind: 'reset' });
    expect(viewKeyCommand('R')).toEqual({ kind: 'reset' });
  });

  test('leaves Tab, Enter, Space, Home, End and letters other than R to the browser and assistive technology', () => {
    for (const k of ['Tab', 'Enter', ' ', 'Home', 'End', 'h', 'k', 'Escape']) expect(viewKeyCommand(k)).toBeNull();
  });
});

describe('viewCommandRun', () => {
  test('calls the matching view action', () => {
    const actions = { rotate: vi.fn(), zoom: vi.fn(), reset: vi.fn() };
    viewCommandRun(actions, viewKeyCommand('ArrowUp')!);
    viewCommandRun(actions, viewKeyCommand('+')!);
    viewCommandRun(actions, viewKeyCommand('r')!);
    expect(actions.rotate).toHaveBeenCalledWith(0, VIEW_ROTATE_STEP_RAD);
    expect(actions.zoom).toHaveBeenCalledWith(1 / VIEW_ZOOM_STEP);
    expect(actions.reset).toHaveBeenCalledOnce();
  });
});
