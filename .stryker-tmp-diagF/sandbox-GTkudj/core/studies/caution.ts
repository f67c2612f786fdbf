/**
 * The caution every trade-study result carries to the screen or report.
 */
// @ts-nocheck

export const STUDY_CAUTION =
  'Preliminary sizing only: the study spreads the assumed ranges, nothing more; certification requirements come from ' +
  'the applicable authority, and final numbers need licensed engineering review.';
