import { demoModels } from '../../../lib/kit/demo-models.server';
import { endpoint } from '../../../lib/http/endpoint';

/** The demo models: id, title and summary (the model itself comes with patterns and kits). */
export const GET = endpoint({ access: ['anyone'] }, () => ({
  models: demoModels().map(({ id, title, summary }) => ({ id, title, summary })),
}));
