import { describe, expect, it } from 'vitest';
import { importsCompat } from '../../config/island-runtimes.mjs';

const ROOT = '/srv/kitwright';

describe('importsCompat (which islands get preact/compat as react)', () => {
  it('gives our 2D islands and their React libraries preact/compat', () => {
    expect(importsCompat(`${ROOT}/src/components/kits/KitBuilder.tsx`)).toBe(true);
    expect(importsCompat(`${ROOT}/src/components/tools/Plot.tsx?astro&type=script`)).toBe(true);
    expect(importsCompat(`${ROOT}/node_modules/react-hook-form/dist/index.esm.mjs`)).toBe(true);
    expect(importsCompat(`${ROOT}/node_modules/@tanstack/react-query/build/modern/index.js`)).toBe(true);
  });

  it('leaves React to the 3D preview, @react-three and every other package', () => {
    expect(importsCompat(`${ROOT}/src/components/preview/FoldCanvas.tsx`)).toBe(false);
    expect(importsCompat(`${ROOT}/node_modules/@react-three/fiber/dist/index.js`)).toBe(false);
    expect(importsCompat(`${ROOT}/node_modules/@astrojs/react/dist/client.js`)).toBe(false);
    expect(importsCompat('C:\\kitwright\\src\\components\\preview\\FoldScene.tsx')).toBe(false);
  });
});
