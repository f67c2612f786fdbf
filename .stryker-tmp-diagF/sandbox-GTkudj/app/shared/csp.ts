/**
 * The page's content security policy, one string for both front ends: the
 * browser-mode server sends it as a header, and index.html carries it in a
 * meta tag for the desktop window. Nothing remote, nothing inline but the
 * page's own worker (started from a blob: URL it makes itself).
 */
// @ts-nocheck

export const CONTENT_SECURITY_POLICY = [
  "default-src 'none'",
  "script-src 'self'",
  // The chance study's worker is built into the page and started from a blob: URL.
  "worker-src 'self' blob:",
  "style-src 'self'",
  "img-src 'self' data:",
  "font-src 'self'",
  "connect-src 'self'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

/** Header-only directives (a meta tag cannot carry them). */
export const HEADER_ONLY_POLICY = "frame-ancestors 'none'";
