import { kitDownloadRoute } from './_download';

/** The kit's SVG, rebuilt from its saved inputs. One sheet per request: ?sheet=N (1-based). */
export const GET = kitDownloadRoute('svg');
