/**
 * The door of browser mode: every /api call must come from our own page on
 * this machine. Three checks, each answered with a status and a message:
 * the Host header (stops DNS rebinding), the Origin header (stops other
 * sites), and the per-launch token (stops other local programs and pages).
 */
// @ts-nocheck

import { timingSafeEqual } from 'node:crypto';

export const TOKEN_HEADER = 'x-loftpoint-token';

export interface GuardContext {
  /** The port the server listens on. */
  port: number;
  /** The per-launch token printed in the address. */
  token: string;
}

export interface ApiRequestHeaders {
  host?: string | undefined;
  origin?: string | undefined;
  'sec-fetch-site'?: string | undefined;
  'content-type'?: string | undefined;
  [TOKEN_HEADER]?: string | string[] | undefined;
}

export interface Refusal {
  status: number;
  message: string;
}

/** Host names a page on this machine may use to reach us. */
function allowedHosts(port: number): string[] {
  return [`127.0.0.1:${port}`, `localhost:${port}`];
}

export function allowedOrigins(port: number): string[] {
  return allowedHosts(port).map((host) => `http://${host}`);
}

/** True when the Host header names this server on the loopback address. */
export function isAllowedHost(host: string | undefined, port: number): boolean {
  return host !== undefined && allowedHosts(port).includes(host.toLowerCase());
}

/** Constant-time comparison, so the token cannot be guessed byte by byte. */
export function tokensMatch(given: unknown, expected: string): boolean {
  if (typeof given !== 'string' || given.length === 0) return false;
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

/** Null when the API call may proceed; otherwise why not. */
export function refuseApiRequest(headers: ApiRequestHeaders, context: GuardContext): Refusal | null {
  if (!isAllowedHost(headers.host, context.port)) {
    return { status: 403, message: `Host header "${headers.host ?? ''}" is not this server; open ${allowedOrigins(context.port)[0]}` };
  }
  if (headers.origin !== undefined && !allowedOrigins(context.port).includes(headers.origin.toLowerCase())) {
    return { status: 403, message: `Origin "${headers.origin}" may not call this server` };
  }
  const site = headers['sec-fetch-site'];
  if (site !== undefined && site !== 'same-origin' && site !== 'none') {
    return { status: 403, message: `cross-site request (${site}) refused` };
  }
  if (!tokensMatch(headers[TOKEN_HEADER], context.token)) {
    return { status: 401, message: 'missing or wrong access token; open the full address that `loftpoint serve` printed' };
  }
  const type = headers['content-type'] ?? '';
  if (!/^application\/json\b/i.test(type)) {
    return { status: 415, message: 'API calls must send Content-Type: application/json' };
  }
  return null;
}
