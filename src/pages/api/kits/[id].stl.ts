import { kitDownloadRoute } from './_download';

/** The kit's STL, rebuilt from its saved inputs. Binary, or ASCII with ?format=ascii. */
export const GET = kitDownloadRoute('stl');
