/**
 * Checks on request fields from in-process callers (transports check the
 * shape first with their own schemas): names, version numbers, tags, the
 * concept of a save, and the default author.
 */
// @ts-nocheck

import { userInfo } from 'node:os';
import type { SaveVersionRequest } from './contract';
import { checkAndEvaluate, checkAndEvaluateText, type CheckedConcept } from './engine';
import { badRequest } from './failure';

const MAX_NAME = 200;
const MAX_TAG = 64;

/** $LOFTPOINT_AUTHOR, else the OS user name, else "unknown". */
export function defaultAuthor(): string {
  const fromEnv = process.env.LOFTPOINT_AUTHOR?.trim();
  if (fromEnv) return fromEnv;
  try {
    return userInfo().username || 'unknown';
  } catch {
    return 'unknown';
  }
}

export function cleanName(value: unknown, field: string): string {
  if (typeof value !== 'string' || value.trim() === '') throw badRequest(field, 'must be a non-empty name');
  const name = value.trim();
  if (name.length > MAX_NAME) throw badRequest(field, `is longer than ${MAX_NAME} characters`);
  return name;
}

export function checkVersionNumber(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 1) {
    throw badRequest(field, `must be a version number (a whole number from 1), got ${JSON.stringify(value)}`);
  }
  return value;
}

export function cleanTag(value: unknown): string {
  if (typeof value !== 'string' || value.trim() === '') throw badRequest('tag', 'must be a non-empty tag');
  const tag = value.trim();
  if (tag.length > MAX_TAG) throw badRequest('tag', `is longer than ${MAX_TAG} characters`);
  return tag;
}

/** The concept of a save request as stored text, checked; exactly one of `concept` and `conceptText`. */
export function conceptInput(request: SaveVersionRequest): { text: string; checked: CheckedConcept } {
  const hasObject = request.concept !== undefined;
  const hasText = request.conceptText !== undefined;
  if (hasObject === hasText) throw badRequest('concept', 'give the concept either as `concept` (an object) or as `conceptText`, not both or neither');
  if (hasObject) return { text: `${JSON.stringify(request.concept, null, 2)}\n`, checked: checkAndEvaluate(request.concept, 'concept') };
  if (typeof request.conceptText !== 'string') throw badRequest('conceptText', 'must be text');
  return { text: request.conceptText, checked: checkAndEvaluateText(request.conceptText, 'concept') };
}

