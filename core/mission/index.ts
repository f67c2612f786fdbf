/** Take-off mass from the mission: segments, Breguet, battery energy, empty-mass regression, closure, drivers. */
export * from './aircraft-class';
export * from './mission';
export * from './segment-fractions';
export * from './empty-mass-fraction';
export * from './breguet';
export * from './battery-energy';
export * from './lift-to-drag';
export * from './fly-mission';
export * from './closure';
export * from './drivers';
export * from './mass';
