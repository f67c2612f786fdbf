/** The window's handles on the drawing's marks, for its tests and tools; not part of the drawing. */
import type { Mark } from '../../../chart/marks';

function testId(mark: Mark): string | undefined {
  const id = mark.attrs['data-id'];
  const axis = mark.attrs['data-axis'];
  switch (mark.role) {
    case 'curve':
    case 'limit':
    case 'label':
      return `${mark.role}-${id}`;
    case 'region':
      return 'feasible-region';
    case 'optimum':
      return 'optimum-marker';
    case 'band':
      return `band-${id}`;
    case 'contour':
    case 'contour-label':
      return mark.role;
    case 'axis-title':
      return `${axis}-title`;
    case 'ticks':
      return `${axis}-axis`;
    default:
      return undefined;
  }
}

/** A mark's `data-testid`, where it has one. */
export function markHandles(mark: Mark): Readonly<Record<string, string>> | undefined {
  const id = testId(mark);
  return id === undefined ? undefined : { 'data-testid': id };
}
