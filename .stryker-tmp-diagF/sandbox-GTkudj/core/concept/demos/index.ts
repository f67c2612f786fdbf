/**
 * The demo concepts offered when a project starts: invented scenarios of
 * our own, one per kind of aircraft the tool is for.
 */
// @ts-nocheck

import { businessJet } from './business-jet';
import type { DemoConcept } from './demo';
import { surveyDrone } from './survey-drone';
import { trainer } from './trainer';
import { utilityTwin } from './utility-twin';

export type { DemoConcept };

export const DEMO_CONCEPTS: ReadonlyArray<DemoConcept> = [trainer, utilityTwin, businessJet, surveyDrone];
