import { serverConfig } from '../server-config';

/** The public base URL links in mail point at: SITE_URL, else the origin the request came in on. */
export function siteUrl(requestUrl: URL): string {
  return serverConfig('SITE_URL') ?? requestUrl.origin;
}

/** True when a request is a plain HTML form post (answer with a redirect, not JSON). */
export function isFormPost(request: Request): boolean {
  const type = (request.headers.get('content-type') ?? '').toLowerCase();
  return type.startsWith('application/x-www-form-urlencoded') || type.startsWith('multipart/form-data');
}
