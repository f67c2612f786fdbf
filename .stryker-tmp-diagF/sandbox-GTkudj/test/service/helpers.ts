/** A service on a fresh project in a temporary folder, with a fixed clock and author. */
// @ts-nocheck

import { join } from 'node:path';
import { DEMO_CONCEPTS } from '../../core';
import { ProjectService } from '../../app/service';
import { freshFolder } from '../store/helpers';

export { freshFolder };

export function serviceWithProject(options: { demo?: boolean } = {}) {
  const folder = freshFolder();
  const file = join(folder, 'project.loftpoint');
  let tick = Date.parse('2025-03-01T12:00:00.000Z');
  const service = new ProjectService({ author: 'tester', now: () => new Date((tick += 60_000)) });
  const info = service.createProject({ file, name: 'Test project', description: 'for tests', demo: options.demo === true });
  return { service, file, folder, info };
}

/** A demo concept as a fresh mutable object. */
export function demoConcept(index = 0): Record<string, any> {
  return structuredClone(DEMO_CONCEPTS[index].concept) as Record<string, any>;
}
