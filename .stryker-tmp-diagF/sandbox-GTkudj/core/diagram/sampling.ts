/**
 * Wing loadings at which the diagram's curves are given.
 */
// @ts-nocheck


/** `samples` points evenly spaced over [lo, hi], both ends included exactly. */function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
export function sampleWingLoadings(range: readonly [number, number], samples: number): Float64Array {
  if (stryMutAct_9fa48("570")) {
    {}
  } else {
    stryCov_9fa48("570");
    const [lo, hi] = range;
    const count = stryMutAct_9fa48("571") ? Math.min(2, Math.floor(samples)) : (stryCov_9fa48("571"), Math.max(2, Math.floor(samples)));
    const out = new Float64Array(count);
    const step = stryMutAct_9fa48("572") ? (hi - lo) * (count - 1) : (stryCov_9fa48("572"), (stryMutAct_9fa48("573") ? hi + lo : (stryCov_9fa48("573"), hi - lo)) / (stryMutAct_9fa48("574") ? count + 1 : (stryCov_9fa48("574"), count - 1)));
    for (let i = 0; stryMutAct_9fa48("577") ? i >= count - 1 : stryMutAct_9fa48("576") ? i <= count - 1 : stryMutAct_9fa48("575") ? false : (stryCov_9fa48("575", "576", "577"), i < (stryMutAct_9fa48("578") ? count + 1 : (stryCov_9fa48("578"), count - 1))); stryMutAct_9fa48("579") ? i-- : (stryCov_9fa48("579"), i++)) out[i] = stryMutAct_9fa48("580") ? lo - i * step : (stryCov_9fa48("580"), lo + (stryMutAct_9fa48("581") ? i / step : (stryCov_9fa48("581"), i * step)));
    out[stryMutAct_9fa48("582") ? count + 1 : (stryCov_9fa48("582"), count - 1)] = hi;
    return out;
  }
}