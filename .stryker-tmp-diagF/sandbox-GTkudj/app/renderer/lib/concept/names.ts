/** How a requirement is named on screen: as on the diagram, its label when short, else its id. */
// @ts-nocheck

import { PLOT_LABEL_CHARS } from '../../../chart/data';

export function plotName(requirement: { id?: unknown; label?: unknown }): string {
  const id = String(requirement.id ?? '');
  const label = typeof requirement.label === 'string' ? requirement.label.trim() : '';
  return label !== '' && [...label].length <= PLOT_LABEL_CHARS ? label : id;
}
