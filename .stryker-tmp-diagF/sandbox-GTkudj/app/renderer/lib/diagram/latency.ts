/**
 * Drag latency as performance measures: from the pointer event's own time
 * stamp to the moment the page has applied the new state to the DOM and laid
 * it out. The benchmark reads the `loftpoint:drag` measures.
 */
// @ts-nocheck

import { tick } from 'svelte';

const DRAG_MEASURE = 'loftpoint:drag';
/** The page's own share: from the handler starting to the laid-out DOM (no input queueing). */
const DRAG_WORK_MEASURE = 'loftpoint:drag-work';
const KEEP = 2000;

export function measureDrag(eventTime: number, handlerStart: number, settle: () => void): void {
  void tick().then(() => {
    settle();
    const end = performance.now();
    performance.measure(DRAG_MEASURE, { start: eventTime, end });
    performance.measure(DRAG_WORK_MEASURE, { start: handlerStart, end });
    if (performance.getEntriesByName(DRAG_MEASURE).length > KEEP) {
      performance.clearMeasures(DRAG_MEASURE);
      performance.clearMeasures(DRAG_WORK_MEASURE);
    }
  });
}
