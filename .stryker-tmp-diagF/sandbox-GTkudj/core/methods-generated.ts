/**
 * The parts of the methods reference (core/methods.md) that belong to a
 * kind or to the typical-range table, written from the descriptors and the
 * table so the document cannot drift from the code. A test keeps the file in
 * step (and rewrites these blocks on request).
 */
// @ts-nocheck

import type { TypicalRange } from './assumptions/typical-range';
import { ASPECT_RATIO, CD0_CLEAN, CD0_INCREMENT, CLMAX, OSWALD } from './assumptions/typical-ranges';
import { PROPULSION_DESCRIPTORS } from './propulsion/kinds';
import { REQUIREMENT_DESCRIPTORS } from './requirements';

/** Section 5: one line per propulsion kind. */
function propulsionBlock(): string {
  return PROPULSION_DESCRIPTORS.map((d) => d.methods).join('\n');
}

/** Section 6.3: one numbered subsection per requirement kind, from its descriptor. */
function requirementBlock(): string {
  return REQUIREMENT_DESCRIPTORS.map((d, i) => {
    const [heading, ...body] = d.methods.split('\n');
    const title = heading.replace(/^###\s*/, '');
    const facts = [
      `- Drawn as: ${d.drawnAs === 'limit' ? 'a limit on wing loading' : 'a curve of required power or thrust'}. Speed used: ${d.speedText}.`,
      `- Configuration when none is named: ${d.defaultConfiguration}. Propeller efficiency: ${d.propeller ? `applies, ${d.propeller.default} by default` : 'does not apply'}.`,
      `- Requirement-cost step: \`${d.costStep.conceptField}\`, relaxed ${d.costStep.relaxed === 'up' ? 'upward' : 'downward'}.`,
    ];
    return [`#### 6.3.${i + 1} ${title}`, ...body, '', ...facts].join('\n');
  }).join('\n\n');
}

function row(what: string, r: TypicalRange): string {
  return `| ${what} | ${r.low}-${r.high} | ${r.text} |`;
}

/** Section 9: the one table of typical ranges, as the engine warns outside it. */
function typicalRangeBlock(): string {
  const rows = [
    row('aspect ratio', ASPECT_RATIO),
    row('clean C_D0', CD0_CLEAN),
    row('Oswald e (any configuration)', OSWALD.clean),
    ...(['clean', 'takeoff', 'landing'] as const).flatMap((role) => {
      const r = CLMAX[role];
      return r ? [row(`C_Lmax, ${role} configuration`, r)] : [];
    }),
    row('C_D0 increment, take-off configuration (window and studies only)', CD0_INCREMENT.takeoff),
    row('C_D0 increment, landing configuration (window and studies only)', CD0_INCREMENT.landing),
    ...PROPULSION_DESCRIPTORS.flatMap((d) => (d.lapseExponent ? [row(`lapse exponent m, ${d.kind}`, d.lapseExponent.typical)] : [])),
    ...REQUIREMENT_DESCRIPTORS.flatMap((d) => [
      ...(d.propeller ? [row(`propeller efficiency, ${d.kind}`, d.propeller.typical)] : []),
      ...d.typicalRanges.map((entry) => row(`${entry.label.toLowerCase()}, ${d.kind}`, entry.range)),
    ]),
  ];
  return ['| assumption | warned outside | typical values and source |', '|---|---|---|', ...rows].join('\n');
}

/** Section 8: the rule templates, from the descriptors. */
function templateBlock(): string {
  const rows = REQUIREMENT_DESCRIPTORS.flatMap((d) => d.templates.map((t) => `| ${t.source} | ${t.title} | \`${d.kind}\` |`));
  return ['| rule | template | kind |', '|---|---|---|', ...rows].join('\n');
}

/** Every generated block of core/methods.md, by the name its markers carry. */
export function generatedMethodsBlocks(): Record<string, string> {
  return {
    propulsion: propulsionBlock(),
    requirements: requirementBlock(),
    templates: templateBlock(),
    'typical-ranges': typicalRangeBlock(),
  };
}
