/** Whether this browser can give a WebGL 2 or WebGL 1 context (false on the server or when WebGL is off). */
export default function webglAvailable(): boolean {
  if (typeof document === 'undefined') return false;
  try {
    const canvas = document.createElement('canvas');
    return Boolean(canvas.getContext('webgl2') ?? canvas.getContext('webgl'));
  } catch {
    return false;
  }
}
