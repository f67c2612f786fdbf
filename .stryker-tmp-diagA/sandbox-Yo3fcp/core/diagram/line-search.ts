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
const GOLDEN = stryMutAct_9fa48("60") ? (Math.sqrt(5) - 1) * 2 : (stryCov_9fa48("60"), (stryMutAct_9fa48("61") ? Math.sqrt(5) + 1 : (stryCov_9fa48("61"), Math.sqrt(5) - 1)) / 2);

/** y plus its relative tolerance: values up to this tie with y. */
export function tieBand(y: number, relative: number): number {
  if (stryMutAct_9fa48("62")) {
    {}
  } else {
    stryCov_9fa48("62");
    return stryMutAct_9fa48("63") ? y - Math.abs(y) * relative : (stryCov_9fa48("63"), y + (stryMutAct_9fa48("64") ? Math.abs(y) / relative : (stryCov_9fa48("64"), Math.abs(y) * relative)));
  }
}

/** Golden-section minimum of f on [a, b] (Kiefer 1953), NaN counted as +Infinity; stops at 1e-7 relative width. */
export function goldenMinimum(f: (w: number) => number, a: number, b: number): [number, number] {
  if (stryMutAct_9fa48("65")) {
    {}
  } else {
    stryCov_9fa48("65");
    const value = (w: number): number => {
      if (stryMutAct_9fa48("66")) {
        {}
      } else {
        stryCov_9fa48("66");
        const y = f(w);
        return (stryMutAct_9fa48("70") ? y > Infinity : stryMutAct_9fa48("69") ? y < Infinity : stryMutAct_9fa48("68") ? false : stryMutAct_9fa48("67") ? true : (stryCov_9fa48("67", "68", "69", "70"), y <= Infinity)) ? y : Infinity;
      }
    };
    let c = stryMutAct_9fa48("71") ? b + GOLDEN * (b - a) : (stryCov_9fa48("71"), b - (stryMutAct_9fa48("72") ? GOLDEN / (b - a) : (stryCov_9fa48("72"), GOLDEN * (stryMutAct_9fa48("73") ? b + a : (stryCov_9fa48("73"), b - a)))));
    let d = stryMutAct_9fa48("74") ? a - GOLDEN * (b - a) : (stryCov_9fa48("74"), a + (stryMutAct_9fa48("75") ? GOLDEN / (b - a) : (stryCov_9fa48("75"), GOLDEN * (stryMutAct_9fa48("76") ? b + a : (stryCov_9fa48("76"), b - a)))));
    let fc = value(c);
    let fd = value(d);
    while (stryMutAct_9fa48("79") ? b - a <= 1e-7 * b : stryMutAct_9fa48("78") ? b - a >= 1e-7 * b : stryMutAct_9fa48("77") ? false : (stryCov_9fa48("77", "78", "79"), (stryMutAct_9fa48("80") ? b + a : (stryCov_9fa48("80"), b - a)) > (stryMutAct_9fa48("81") ? 1e-7 / b : (stryCov_9fa48("81"), 1e-7 * b)))) {
      if (stryMutAct_9fa48("82")) {
        {}
      } else {
        stryCov_9fa48("82");
        if (stryMutAct_9fa48("86") ? fc > fd : stryMutAct_9fa48("85") ? fc < fd : stryMutAct_9fa48("84") ? false : stryMutAct_9fa48("83") ? true : (stryCov_9fa48("83", "84", "85", "86"), fc <= fd)) {
          if (stryMutAct_9fa48("87")) {
            {}
          } else {
            stryCov_9fa48("87");
            b = d;
            d = c;
            fd = fc;
            c = stryMutAct_9fa48("88") ? b + GOLDEN * (b - a) : (stryCov_9fa48("88"), b - (stryMutAct_9fa48("89") ? GOLDEN / (b - a) : (stryCov_9fa48("89"), GOLDEN * (stryMutAct_9fa48("90") ? b + a : (stryCov_9fa48("90"), b - a)))));
            fc = value(c);
          }
        } else {
          if (stryMutAct_9fa48("91")) {
            {}
          } else {
            stryCov_9fa48("91");
            a = c;
            c = d;
            fc = fd;
            d = stryMutAct_9fa48("92") ? a - GOLDEN * (b - a) : (stryCov_9fa48("92"), a + (stryMutAct_9fa48("93") ? GOLDEN / (b - a) : (stryCov_9fa48("93"), GOLDEN * (stryMutAct_9fa48("94") ? b + a : (stryCov_9fa48("94"), b - a)))));
            fd = value(d);
          }
        }
      }
    }
    return (stryMutAct_9fa48("98") ? fc > fd : stryMutAct_9fa48("97") ? fc < fd : stryMutAct_9fa48("96") ? false : stryMutAct_9fa48("95") ? true : (stryCov_9fa48("95", "96", "97", "98"), fc <= fd)) ? stryMutAct_9fa48("99") ? [] : (stryCov_9fa48("99"), [c, fc]) : stryMutAct_9fa48("100") ? [] : (stryCov_9fa48("100"), [d, fd]);
  }
}

/**
 * The largest w in [from, to] with f(w) <= limit, by bisection, assuming one
 * crossing; `from` must qualify. A first probe just right of `from` settles
 * the common case, a strict minimum, without bisecting.
 */
export function lastWithin(f: (w: number) => number, from: number, to: number, limit: number): number {
  if (stryMutAct_9fa48("101")) {
    {}
  } else {
    stryCov_9fa48("101");
    const probe = stryMutAct_9fa48("102") ? Math.max(to, from * (1 + 1e-4)) : (stryCov_9fa48("102"), Math.min(to, stryMutAct_9fa48("103") ? from / (1 + 1e-4) : (stryCov_9fa48("103"), from * (stryMutAct_9fa48("104") ? 1 - 1e-4 : (stryCov_9fa48("104"), 1 + 1e-4)))));
    if (stryMutAct_9fa48("107") ? false : stryMutAct_9fa48("106") ? true : stryMutAct_9fa48("105") ? f(probe) <= limit : (stryCov_9fa48("105", "106", "107"), !(stryMutAct_9fa48("111") ? f(probe) > limit : stryMutAct_9fa48("110") ? f(probe) < limit : stryMutAct_9fa48("109") ? false : stryMutAct_9fa48("108") ? true : (stryCov_9fa48("108", "109", "110", "111"), f(probe) <= limit)))) return from;
    let ok = probe;
    let bad = to;
    if (stryMutAct_9fa48("115") ? f(bad) > limit : stryMutAct_9fa48("114") ? f(bad) < limit : stryMutAct_9fa48("113") ? false : stryMutAct_9fa48("112") ? true : (stryCov_9fa48("112", "113", "114", "115"), f(bad) <= limit)) return bad;
    while (stryMutAct_9fa48("118") ? bad - ok <= 1e-9 * bad : stryMutAct_9fa48("117") ? bad - ok >= 1e-9 * bad : stryMutAct_9fa48("116") ? false : (stryCov_9fa48("116", "117", "118"), (stryMutAct_9fa48("119") ? bad + ok : (stryCov_9fa48("119"), bad - ok)) > (stryMutAct_9fa48("120") ? 1e-9 / bad : (stryCov_9fa48("120"), 1e-9 * bad)))) {
      if (stryMutAct_9fa48("121")) {
        {}
      } else {
        stryCov_9fa48("121");
        const mid = stryMutAct_9fa48("122") ? 0.5 / (ok + bad) : (stryCov_9fa48("122"), 0.5 * (stryMutAct_9fa48("123") ? ok - bad : (stryCov_9fa48("123"), ok + bad)));
        if (stryMutAct_9fa48("127") ? f(mid) > limit : stryMutAct_9fa48("126") ? f(mid) < limit : stryMutAct_9fa48("125") ? false : stryMutAct_9fa48("124") ? true : (stryCov_9fa48("124", "125", "126", "127"), f(mid) <= limit)) ok = mid;else bad = mid;
      }
    }
    return ok;
  }
}