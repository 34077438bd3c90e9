/** The app version from package.json, inlined at build time. */
import pkg from '../../package.json' with { type: 'json' };

export const APP_VERSION: string = pkg.version;
