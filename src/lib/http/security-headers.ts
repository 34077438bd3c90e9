/**
 * The security headers of every HTML page, in one place: the Content-Security-Policy directives (astro.config.mjs
 * hands them to Astro, which adds the SHA-256 hashes of the inline scripts it renders, so no script runs unless
 * it is a file of this site or one of those exact scripts; no 'unsafe-inline' for scripts) and the headers the
 * middleware sets (src/middleware.ts). After the OWASP HTTP Headers Cheat Sheet and OWASP Clickjacking Defense
 * Cheat Sheet (frame-ancestors 'none' plus X-Frame-Options DENY for browsers without CSP level 2).
 */

/** CSP directives other than script-src and style-src (Astro writes those two with its hashes). */
export const CSP_DIRECTIVES = [
  "default-src 'self'",
  // Sheet previews and QR codes are data: URLs; the 3D preview and downloads make blob: URLs.
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
] as const;

/** Sources of scripts besides Astro's hashed inline ones: this site's own files only. */
export const CSP_SCRIPT_SOURCES: readonly string[] = ["'self'"];

/**
 * Sources of styles. Islands render style attributes (a plot's height, a progress bar's width), which CSP can
 * allow only with 'unsafe-inline'; styles cannot run code, and the build writes no inline <style> element
 * (astro.config.mjs: inlineStylesheets 'never'), so no hash makes browsers ignore 'unsafe-inline'.
 */
export const CSP_STYLE_SOURCES: readonly string[] = ["'self'", "'unsafe-inline'"];

/** HSTS for a site served over https (RFC 6797): a year, subdomains included (common practice, no source). */
export const HSTS_VALUE = 'max-age=31536000; includeSubDomains';

/**
 * The headers the middleware adds to every HTML page: clickjacking, MIME sniffing and referrer rules, and HSTS
 * when SITE_URL is https (a local http run must not pin its host to https).
 */
export function pageSecurityHeaders(siteUrl: string | undefined): Record<string, string> {
  return {
    'x-frame-options': 'DENY',
    'x-content-type-options': 'nosniff',
    // Links to other sites carry no path: a class page's address names a class of minors.
    'referrer-policy': 'same-origin',
    ...(siteUrl?.startsWith('https://') ? { 'strict-transport-security': HSTS_VALUE } : {}),
  };
}

/**
 * The policy Astro wrote, with the hashes taken out of style-src: Astro hashes its own inline <style> elements,
 * and a hash makes browsers ignore 'unsafe-inline' (CSP Level 3 §6.7.3.3), which the islands' style attributes
 * need. Script hashes stay.
 */
export function cspStyleHashesDropped(policy: string): string {
  return policy
    .split(';')
    .map((directive) =>
      /^\s*style-src\s/.test(directive)
        ? directive
            .split(/\s+/)
            .filter((token) => !/^'sha(256|384|512)-/.test(token))
            .join(' ')
        : directive,
    )
    .join(';');
}
