/** The per-launch access token: 192 random bits, URL-safe. */
// @ts-nocheck

import { randomBytes } from 'node:crypto';

export function createLaunchToken(): string {
  return randomBytes(24).toString('base64url');
}
