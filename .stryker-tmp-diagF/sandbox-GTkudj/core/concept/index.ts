/**
 * The concept file, format `loftpoint-concept/1`: its schema, reading and
 * resolution to the SI design model, migrations, and the demo concepts.
 */
// @ts-nocheck

export { CONCEPT_FORMAT, formatIssue, type ConceptIssue } from './format';
export type { ConceptJson, RequirementJson } from './schema';
export { parseConcept, parseConceptText, type ParsedConcept, type ConceptUncertainty } from './parse';
export {
  migrateConcept,
  createConceptMigrator,
  CONCEPT_MIGRATIONS,
  type ConceptMigration,
  type ConceptDocument,
  type MigrationResult,
} from './migrate';
export * as conceptDefaults from './defaults';
export { DEMO_CONCEPTS, type DemoConcept } from './demos';
