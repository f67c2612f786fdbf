/** The preliminary-sizing caution that every diagram and report carries. */
export const SIZING_CAUTION =
  'Preliminary sizing — certification requirements come from the applicable authority; final numbers need licensed engineering review.';
