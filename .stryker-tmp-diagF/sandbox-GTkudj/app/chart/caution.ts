/** The preliminary-sizing caution that every diagram and report carries (one wording, from core). */
// @ts-nocheck

export { PRELIMINARY_CAUTION as SIZING_CAUTION } from '../../core/caution';
