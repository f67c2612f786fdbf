/**
 * A root of a monotone function of one variable by bracketing and
 * bisection: first widen an upper bracket, then halve it.
 */
// @ts-nocheck


/**
 * The x in [low, high·2^k] where f(x) crosses zero, for f that falls from
 * positive to negative with x (NaN or +Infinity count as positive, i.e. "not
 * reached yet"). The upper end doubles up to `maxHigh` until f is negative.
 * NaN when f is never negative below maxHigh, or already negative at low.
 * Bisection to a relative width of 1e-10 (at most 200 halvings).
 */function stryNS_9fa48() {
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
export function fallingRoot(f: (x: number) => number, low: number, high: number, maxHigh: number): number {
  if (stryMutAct_9fa48("628")) {
    {}
  } else {
    stryCov_9fa48("628");
    const positive = (x: number): boolean => {
      if (stryMutAct_9fa48("629")) {
        {}
      } else {
        stryCov_9fa48("629");
        const y = f(x);
        return stryMutAct_9fa48("630") ? y <= 0 : (stryCov_9fa48("630"), !(stryMutAct_9fa48("634") ? y > 0 : stryMutAct_9fa48("633") ? y < 0 : stryMutAct_9fa48("632") ? false : stryMutAct_9fa48("631") ? true : (stryCov_9fa48("631", "632", "633", "634"), y <= 0)));
      }
    };
    if (stryMutAct_9fa48("637") ? !(low < high) && !positive(low) : stryMutAct_9fa48("636") ? false : stryMutAct_9fa48("635") ? true : (stryCov_9fa48("635", "636", "637"), (stryMutAct_9fa48("638") ? low < high : (stryCov_9fa48("638"), !(stryMutAct_9fa48("642") ? low >= high : stryMutAct_9fa48("641") ? low <= high : stryMutAct_9fa48("640") ? false : stryMutAct_9fa48("639") ? true : (stryCov_9fa48("639", "640", "641", "642"), low < high)))) || (stryMutAct_9fa48("643") ? positive(low) : (stryCov_9fa48("643"), !positive(low))))) return NaN;
    let hi = high;
    while (stryMutAct_9fa48("644") ? false : (stryCov_9fa48("644"), positive(hi))) {
      if (stryMutAct_9fa48("645")) {
        {}
      } else {
        stryCov_9fa48("645");
        if (stryMutAct_9fa48("649") ? hi < maxHigh : stryMutAct_9fa48("648") ? hi > maxHigh : stryMutAct_9fa48("647") ? false : stryMutAct_9fa48("646") ? true : (stryCov_9fa48("646", "647", "648", "649"), hi >= maxHigh)) return NaN;
        hi = stryMutAct_9fa48("650") ? Math.max(maxHigh, hi * 2) : (stryCov_9fa48("650"), Math.min(maxHigh, stryMutAct_9fa48("651") ? hi / 2 : (stryCov_9fa48("651"), hi * 2)));
      }
    }
    let lo = low;
    for (let i = 0; stryMutAct_9fa48("653") ? i < 200 || hi - lo > 1e-10 * hi : stryMutAct_9fa48("652") ? false : (stryCov_9fa48("652", "653"), (stryMutAct_9fa48("656") ? i >= 200 : stryMutAct_9fa48("655") ? i <= 200 : stryMutAct_9fa48("654") ? true : (stryCov_9fa48("654", "655", "656"), i < 200)) && (stryMutAct_9fa48("659") ? hi - lo <= 1e-10 * hi : stryMutAct_9fa48("658") ? hi - lo >= 1e-10 * hi : stryMutAct_9fa48("657") ? true : (stryCov_9fa48("657", "658", "659"), (stryMutAct_9fa48("660") ? hi + lo : (stryCov_9fa48("660"), hi - lo)) > (stryMutAct_9fa48("661") ? 1e-10 / hi : (stryCov_9fa48("661"), 1e-10 * hi))))); stryMutAct_9fa48("662") ? i-- : (stryCov_9fa48("662"), i++)) {
      if (stryMutAct_9fa48("663")) {
        {}
      } else {
        stryCov_9fa48("663");
        const mid = stryMutAct_9fa48("664") ? 0.5 / (lo + hi) : (stryCov_9fa48("664"), 0.5 * (stryMutAct_9fa48("665") ? lo - hi : (stryCov_9fa48("665"), lo + hi)));
        if (stryMutAct_9fa48("667") ? false : stryMutAct_9fa48("666") ? true : (stryCov_9fa48("666", "667"), positive(mid))) lo = mid;else hi = mid;
      }
    }
    return stryMutAct_9fa48("668") ? 0.5 / (lo + hi) : (stryCov_9fa48("668"), 0.5 * (stryMutAct_9fa48("669") ? lo - hi : (stryCov_9fa48("669"), lo + hi)));
  }
}