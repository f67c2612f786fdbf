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
const GOLDEN = stryMutAct_9fa48("761") ? (Math.sqrt(5) - 1) * 2 : (stryCov_9fa48("761"), (stryMutAct_9fa48("762") ? Math.sqrt(5) + 1 : (stryCov_9fa48("762"), Math.sqrt(5) - 1)) / 2);

/** y plus its relative tolerance: values up to this tie with y. */
export function tieBand(y: number, relative: number): number {
  if (stryMutAct_9fa48("763")) {
    {}
  } else {
    stryCov_9fa48("763");
    return stryMutAct_9fa48("764") ? y - Math.abs(y) * relative : (stryCov_9fa48("764"), y + (stryMutAct_9fa48("765") ? Math.abs(y) / relative : (stryCov_9fa48("765"), Math.abs(y) * relative)));
  }
}

/** Golden-section minimum of f on [a, b] (Kiefer 1953), NaN counted as +Infinity; stops at 1e-7 relative width. */
export function goldenMinimum(f: (w: number) => number, a: number, b: number): [number, number] {
  if (stryMutAct_9fa48("766")) {
    {}
  } else {
    stryCov_9fa48("766");
    const value = (w: number): number => {
      if (stryMutAct_9fa48("767")) {
        {}
      } else {
        stryCov_9fa48("767");
        const y = f(w);
        return (stryMutAct_9fa48("771") ? y > Infinity : stryMutAct_9fa48("770") ? y < Infinity : stryMutAct_9fa48("769") ? false : stryMutAct_9fa48("768") ? true : (stryCov_9fa48("768", "769", "770", "771"), y <= Infinity)) ? y : Infinity;
      }
    };
    let c = stryMutAct_9fa48("772") ? b + GOLDEN * (b - a) : (stryCov_9fa48("772"), b - (stryMutAct_9fa48("773") ? GOLDEN / (b - a) : (stryCov_9fa48("773"), GOLDEN * (stryMutAct_9fa48("774") ? b + a : (stryCov_9fa48("774"), b - a)))));
    let d = stryMutAct_9fa48("775") ? a - GOLDEN * (b - a) : (stryCov_9fa48("775"), a + (stryMutAct_9fa48("776") ? GOLDEN / (b - a) : (stryCov_9fa48("776"), GOLDEN * (stryMutAct_9fa48("777") ? b + a : (stryCov_9fa48("777"), b - a)))));
    let fc = value(c);
    let fd = value(d);
    while (stryMutAct_9fa48("780") ? b - a <= 1e-7 * b : stryMutAct_9fa48("779") ? b - a >= 1e-7 * b : stryMutAct_9fa48("778") ? false : (stryCov_9fa48("778", "779", "780"), (stryMutAct_9fa48("781") ? b + a : (stryCov_9fa48("781"), b - a)) > (stryMutAct_9fa48("782") ? 1e-7 / b : (stryCov_9fa48("782"), 1e-7 * b)))) {
      if (stryMutAct_9fa48("783")) {
        {}
      } else {
        stryCov_9fa48("783");
        if (stryMutAct_9fa48("787") ? fc > fd : stryMutAct_9fa48("786") ? fc < fd : stryMutAct_9fa48("785") ? false : stryMutAct_9fa48("784") ? true : (stryCov_9fa48("784", "785", "786", "787"), fc <= fd)) {
          if (stryMutAct_9fa48("788")) {
            {}
          } else {
            stryCov_9fa48("788");
            b = d;
            d = c;
            fd = fc;
            c = stryMutAct_9fa48("789") ? b + GOLDEN * (b - a) : (stryCov_9fa48("789"), b - (stryMutAct_9fa48("790") ? GOLDEN / (b - a) : (stryCov_9fa48("790"), GOLDEN * (stryMutAct_9fa48("791") ? b + a : (stryCov_9fa48("791"), b - a)))));
            fc = value(c);
          }
        } else {
          if (stryMutAct_9fa48("792")) {
            {}
          } else {
            stryCov_9fa48("792");
            a = c;
            c = d;
            fc = fd;
            d = stryMutAct_9fa48("793") ? a - GOLDEN * (b - a) : (stryCov_9fa48("793"), a + (stryMutAct_9fa48("794") ? GOLDEN / (b - a) : (stryCov_9fa48("794"), GOLDEN * (stryMutAct_9fa48("795") ? b + a : (stryCov_9fa48("795"), b - a)))));
            fd = value(d);
          }
        }
      }
    }
    return (stryMutAct_9fa48("799") ? fc > fd : stryMutAct_9fa48("798") ? fc < fd : stryMutAct_9fa48("797") ? false : stryMutAct_9fa48("796") ? true : (stryCov_9fa48("796", "797", "798", "799"), fc <= fd)) ? stryMutAct_9fa48("800") ? [] : (stryCov_9fa48("800"), [c, fc]) : stryMutAct_9fa48("801") ? [] : (stryCov_9fa48("801"), [d, fd]);
  }
}

/**
 * The largest w in [from, to] with f(w) <= limit, by bisection, assuming one
 * crossing; `from` must qualify. A first probe just right of `from` settles
 * the common case, a strict minimum, without bisecting.
 */
export function lastWithin(f: (w: number) => number, from: number, to: number, limit: number): number {
  if (stryMutAct_9fa48("802")) {
    {}
  } else {
    stryCov_9fa48("802");
    const probe = stryMutAct_9fa48("803") ? Math.max(to, from * (1 + 1e-4)) : (stryCov_9fa48("803"), Math.min(to, stryMutAct_9fa48("804") ? from / (1 + 1e-4) : (stryCov_9fa48("804"), from * (stryMutAct_9fa48("805") ? 1 - 1e-4 : (stryCov_9fa48("805"), 1 + 1e-4)))));
    if (stryMutAct_9fa48("808") ? false : stryMutAct_9fa48("807") ? true : stryMutAct_9fa48("806") ? f(probe) <= limit : (stryCov_9fa48("806", "807", "808"), !(stryMutAct_9fa48("812") ? f(probe) > limit : stryMutAct_9fa48("811") ? f(probe) < limit : stryMutAct_9fa48("810") ? false : stryMutAct_9fa48("809") ? true : (stryCov_9fa48("809", "810", "811", "812"), f(probe) <= limit)))) return from;
    let ok = probe;
    let bad = to;
    if (stryMutAct_9fa48("816") ? f(bad) > limit : stryMutAct_9fa48("815") ? f(bad) < limit : stryMutAct_9fa48("814") ? false : stryMutAct_9fa48("813") ? true : (stryCov_9fa48("813", "814", "815", "816"), f(bad) <= limit)) return bad;
    while (stryMutAct_9fa48("819") ? bad - ok <= 1e-9 * bad : stryMutAct_9fa48("818") ? bad - ok >= 1e-9 * bad : stryMutAct_9fa48("817") ? false : (stryCov_9fa48("817", "818", "819"), (stryMutAct_9fa48("820") ? bad + ok : (stryCov_9fa48("820"), bad - ok)) > (stryMutAct_9fa48("821") ? 1e-9 / bad : (stryCov_9fa48("821"), 1e-9 * bad)))) {
      if (stryMutAct_9fa48("822")) {
        {}
      } else {
        stryCov_9fa48("822");
        const mid = stryMutAct_9fa48("823") ? 0.5 / (ok + bad) : (stryCov_9fa48("823"), 0.5 * (stryMutAct_9fa48("824") ? ok - bad : (stryCov_9fa48("824"), ok + bad)));
        if (stryMutAct_9fa48("828") ? f(mid) > limit : stryMutAct_9fa48("827") ? f(mid) < limit : stryMutAct_9fa48("826") ? false : stryMutAct_9fa48("825") ? true : (stryCov_9fa48("825", "826", "827", "828"), f(mid) <= limit)) ok = mid;else bad = mid;
      }
    }
    return ok;
  }
}