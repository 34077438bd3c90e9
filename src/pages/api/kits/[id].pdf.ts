import { kitDownloadRoute } from './_download';

/** The kit's PDF, rebuilt from its saved inputs. */
export const GET = kitDownloadRoute('pdf');
