/**
 * Normally aspirated piston engine: power falls with density.
 */
// @ts-nocheck

import { pistonLapse } from '../lapse';
import { definePropulsion } from './descriptor';

export const piston = definePropulsion({
  kind: 'piston',
  title: 'Piston',
  propeller: true,
  lapse: (sigma) => pistonLapse(sigma),
  lapseExponent: null,
  lapseModels: ['density'],
  needsCriticalAltitude: false,
  cd0Band: 0,
  methods: '- **piston**: alpha = sigma - (1 - sigma)/7.55 = 1.132 sigma - 0.132 (Gagg and Ferrar, NACA, 1934, as given by Gudmundsson, *General Aviation Aircraft Design*; from memory).',
});
