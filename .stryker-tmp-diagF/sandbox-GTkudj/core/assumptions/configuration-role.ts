/**
 * Which configurations count as take-off and which as landing: the one place
 * that decides it, for the warnings, the window's marks and the studies.
 * Names are read as the trade uses them ("landing", "approach", "takeoff",
 * "take-off", "second-segment", "climb").
 */
// @ts-nocheck


export type ConfigurationRole = 'clean' | 'takeoff' | 'landing' | 'other';

export function configurationRole(name: string): ConfigurationRole {
  if (name === 'clean') return 'clean';
  const n = name.toLowerCase();
  if (n.includes('land') || n.includes('approach')) return 'landing';
  if (n.includes('takeoff') || n.includes('take-off') || n.includes('second-segment') || n.includes('climb')) return 'takeoff';
  return 'other';
}
