import { endpoint } from '../../../../lib/http/endpoint';
import { photoServe } from '../_serve';

/** A photo's thumbnail (≤ 400 px JPEG), with the same access as the photo. */
export const GET = endpoint({ access: ['anyone'] }, ({ locals, params }) =>
  photoServe(locals.actor, params.id ?? '', 'thumbnail'),
);
