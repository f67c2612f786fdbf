/**
 * The caution every screen, report and human-readable output carries: one
 * wording, kept here so the CLI, the window and the reports say the same.
 */
// @ts-nocheck

export const PRELIMINARY_CAUTION =
  'Preliminary sizing only: certification requirements come from the applicable authority, and final numbers need licensed engineering review.';
