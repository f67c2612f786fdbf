// @ts-nocheck
// Module hooks for the desktop contract test: `electron` resolves to the
// stand-in (electron-stand-in.mjs), which is not Electron.
let standIn;

export function initialize(data) {
  standIn = data.standIn;
}

export async function resolve(specifier, context, next) {
  if (specifier === 'electron') return { url: standIn, shortCircuit: true };
  return next(specifier, context);
}
