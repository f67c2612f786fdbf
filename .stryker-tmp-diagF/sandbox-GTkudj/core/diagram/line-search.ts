/**
 * One-dimensional searches used to refine the optimum between grid points.
 */
// @ts-nocheck
function stryNS_9fa48() {
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
const GOLDEN = stryMutAct_9fa48("172") ? (Math.sqrt(5) - 1) * 2 : (stryCov_9fa48("172"), (stryMutAct_9fa48("173") ? Math.sqrt(5) + 1 : (stryCov_9fa48("173"), Math.sqrt(5) - 1)) / 2);

/** y plus its relative tolerance: values up to this tie with y. */
export function tieBand(y: number, relative: number): number {
  if (stryMutAct_9fa48("174")) {
    {}
  } else {
    stryCov_9fa48("174");
    return stryMutAct_9fa48("175") ? y - Math.abs(y) * relative : (stryCov_9fa48("175"), y + (stryMutAct_9fa48("176") ? Math.abs(y) / relative : (stryCov_9fa48("176"), Math.abs(y) * relative)));
  }
}

/** Golden-section minimum of f on [a, b] (Kiefer 1953), NaN counted as +Infinity; stops at 1e-7 relative width. */
export function goldenMinimum(f: (w: number) => number, a: number, b: number): [number, number] {
  if (stryMutAct_9fa48("177")) {
    {}
  } else {
    stryCov_9fa48("177");
    const value = (w: number): number => {
      if (stryMutAct_9fa48("178")) {
        {}
      } else {
        stryCov_9fa48("178");
        const y = f(w);
        return (stryMutAct_9fa48("182") ? y > Infinity : stryMutAct_9fa48("181") ? y < Infinity : stryMutAct_9fa48("180") ? false : stryMutAct_9fa48("179") ? true : (stryCov_9fa48("179", "180", "181", "182"), y <= Infinity)) ? y : Infinity;
      }
    };
    let c = stryMutAct_9fa48("183") ? b + GOLDEN * (b - a) : (stryCov_9fa48("183"), b - (stryMutAct_9fa48("184") ? GOLDEN / (b - a) : (stryCov_9fa48("184"), GOLDEN * (stryMutAct_9fa48("185") ? b + a : (stryCov_9fa48("185"), b - a)))));
    let d = stryMutAct_9fa48("186") ? a - GOLDEN * (b - a) : (stryCov_9fa48("186"), a + (stryMutAct_9fa48("187") ? GOLDEN / (b - a) : (stryCov_9fa48("187"), GOLDEN * (stryMutAct_9fa48("188") ? b + a : (stryCov_9fa48("188"), b - a)))));
    let fc = value(c);
    let fd = value(d);
    while (stryMutAct_9fa48("191") ? b - a <= 1e-7 * b : stryMutAct_9fa48("190") ? b - a >= 1e-7 * b : stryMutAct_9fa48("189") ? false : (stryCov_9fa48("189", "190", "191"), (stryMutAct_9fa48("192") ? b + a : (stryCov_9fa48("192"), b - a)) > (stryMutAct_9fa48("193") ? 1e-7 / b : (stryCov_9fa48("193"), 1e-7 * b)))) {
      if (stryMutAct_9fa48("194")) {
        {}
      } else {
        stryCov_9fa48("194");
        if (stryMutAct_9fa48("198") ? fc > fd : stryMutAct_9fa48("197") ? fc < fd : stryMutAct_9fa48("196") ? false : stryMutAct_9fa48("195") ? true : (stryCov_9fa48("195", "196", "197", "198"), fc <= fd)) {
          if (stryMutAct_9fa48("199")) {
            {}
          } else {
            stryCov_9fa48("199");
            b = d;
            d = c;
            fd = fc;
            c = stryMutAct_9fa48("200") ? b + GOLDEN * (b - a) : (stryCov_9fa48("200"), b - (stryMutAct_9fa48("201") ? GOLDEN / (b - a) : (stryCov_9fa48("201"), GOLDEN * (stryMutAct_9fa48("202") ? b + a : (stryCov_9fa48("202"), b - a)))));
            fc = value(c);
          }
        } else {
          if (stryMutAct_9fa48("203")) {
            {}
          } else {
            stryCov_9fa48("203");
            a = c;
            c = d;
            fc = fd;
            d = stryMutAct_9fa48("204") ? a - GOLDEN * (b - a) : (stryCov_9fa48("204"), a + (stryMutAct_9fa48("205") ? GOLDEN / (b - a) : (stryCov_9fa48("205"), GOLDEN * (stryMutAct_9fa48("206") ? b + a : (stryCov_9fa48("206"), b - a)))));
            fd = value(d);
          }
        }
      }
    }
    return (stryMutAct_9fa48("210") ? fc > fd : stryMutAct_9fa48("209") ? fc < fd : stryMutAct_9fa48("208") ? false : stryMutAct_9fa48("207") ? true : (stryCov_9fa48("207", "208", "209", "210"), fc <= fd)) ? stryMutAct_9fa48("211") ? [] : (stryCov_9fa48("211"), [c, fc]) : stryMutAct_9fa48("212") ? [] : (stryCov_9fa48("212"), [d, fd]);
  }
}

/**
 * The largest w in [from, to] with f(w) <= limit, by bisection, assuming one
 * crossing; `from` must qualify. A first probe just right of `from` settles
 * the common case, a strict minimum, without bisecting.
 */
export function lastWithin(f: (w: number) => number, from: number, to: number, limit: number): number {
  if (stryMutAct_9fa48("213")) {
    {}
  } else {
    stryCov_9fa48("213");
    const probe = stryMutAct_9fa48("214") ? Math.max(to, from * (1 + 1e-4)) : (stryCov_9fa48("214"), Math.min(to, stryMutAct_9fa48("215") ? from / (1 + 1e-4) : (stryCov_9fa48("215"), from * (stryMutAct_9fa48("216") ? 1 - 1e-4 : (stryCov_9fa48("216"), 1 + 1e-4)))));
    if (stryMutAct_9fa48("219") ? false : stryMutAct_9fa48("218") ? true : stryMutAct_9fa48("217") ? f(probe) <= limit : (stryCov_9fa48("217", "218", "219"), !(stryMutAct_9fa48("223") ? f(probe) > limit : stryMutAct_9fa48("222") ? f(probe) < limit : stryMutAct_9fa48("221") ? false : stryMutAct_9fa48("220") ? true : (stryCov_9fa48("220", "221", "222", "223"), f(probe) <= limit)))) return from;
    let ok = probe;
    let bad = to;
    if (stryMutAct_9fa48("227") ? f(bad) > limit : stryMutAct_9fa48("226") ? f(bad) < limit : stryMutAct_9fa48("225") ? false : stryMutAct_9fa48("224") ? true : (stryCov_9fa48("224", "225", "226", "227"), f(bad) <= limit)) return bad;
    while (stryMutAct_9fa48("230") ? bad - ok <= 1e-9 * bad : stryMutAct_9fa48("229") ? bad - ok >= 1e-9 * bad : stryMutAct_9fa48("228") ? false : (stryCov_9fa48("228", "229", "230"), (stryMutAct_9fa48("231") ? bad + ok : (stryCov_9fa48("231"), bad - ok)) > (stryMutAct_9fa48("232") ? 1e-9 / bad : (stryCov_9fa48("232"), 1e-9 * bad)))) {
      if (stryMutAct_9fa48("233")) {
        {}
      } else {
        stryCov_9fa48("233");
        const mid = stryMutAct_9fa48("234") ? 0.5 / (ok + bad) : (stryCov_9fa48("234"), 0.5 * (stryMutAct_9fa48("235") ? ok - bad : (stryCov_9fa48("235"), ok + bad)));
        if (stryMutAct_9fa48("239") ? f(mid) > limit : stryMutAct_9fa48("238") ? f(mid) < limit : stryMutAct_9fa48("237") ? false : stryMutAct_9fa48("236") ? true : (stryCov_9fa48("236", "237", "238", "239"), f(mid) <= limit)) ok = mid;else bad = mid;
      }
    }
    return ok;
  }
}