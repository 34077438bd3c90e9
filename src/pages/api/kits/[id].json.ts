import { kitDownloadRoute } from './_download';

/** The kit's JSON, rebuilt from its saved inputs. */
export const GET = kitDownloadRoute('json');
