/**
 * The wing-loading range drawn when the concept gives none: one that shows
 * every boundary.
 *
 * - Upper end: 1.3 x the largest wing-loading limit, so every limit line
 *   stands clear of the right edge. With no limit, twice the wing loading at
 *   which the envelope is lowest (searched over 50 Pa to 10 kPa), within
 *   250 Pa to 20 kPa; 150 psf when no curve can be met anywhere.
 * - Lower end: a tenth of the upper end, raised to where the envelope has
 *   climbed to 5 x its lowest value, so the steep left branch of the curves
 *   does not squash the rest of the picture.
 * - Both ends widen to keep a design point inside, then round outwards to
 *   two significant figures.
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
import { PSF_PA } from '../units/factors';
import { definedEnvelopeAt, envelopeAt, type RequiredLoading } from './envelope';
const LIMIT_HEADROOM = 1.3;
const LOWER_FRACTION = 0.1;
const STEEP_RATIO = 5;
const FALLBACK_UPPER_PA = stryMutAct_9fa48("216") ? 150 / PSF_PA : (stryCov_9fa48("216"), 150 * PSF_PA);
const SEARCH_PA: [number, number] = stryMutAct_9fa48("217") ? [] : (stryCov_9fa48("217"), [50, 10000]);

/** Wing loading at which f is lowest on a log grid, ties to the largest; NaN when f is never finite. */
function lowestOnLogGrid(f: (w: number) => number, [lo, hi]: [number, number], points: number): number {
  if (stryMutAct_9fa48("218")) {
    {}
  } else {
    stryCov_9fa48("218");
    let best = Infinity;
    let at = NaN;
    for (let i = 0; stryMutAct_9fa48("221") ? i >= points : stryMutAct_9fa48("220") ? i <= points : stryMutAct_9fa48("219") ? false : (stryCov_9fa48("219", "220", "221"), i < points); stryMutAct_9fa48("222") ? i-- : (stryCov_9fa48("222"), i++)) {
      if (stryMutAct_9fa48("223")) {
        {}
      } else {
        stryCov_9fa48("223");
        const w = stryMutAct_9fa48("224") ? lo / Math.pow(hi / lo, i / (points - 1)) : (stryCov_9fa48("224"), lo * Math.pow(stryMutAct_9fa48("225") ? hi * lo : (stryCov_9fa48("225"), hi / lo), stryMutAct_9fa48("226") ? i * (points - 1) : (stryCov_9fa48("226"), i / (stryMutAct_9fa48("227") ? points + 1 : (stryCov_9fa48("227"), points - 1)))));
        const y = f(w);
        if (stryMutAct_9fa48("231") ? y > best * (1 + 1e-9) + 1e-300 : stryMutAct_9fa48("230") ? y < best * (1 + 1e-9) + 1e-300 : stryMutAct_9fa48("229") ? false : stryMutAct_9fa48("228") ? true : (stryCov_9fa48("228", "229", "230", "231"), y <= (stryMutAct_9fa48("232") ? best * (1 + 1e-9) - 1e-300 : (stryCov_9fa48("232"), (stryMutAct_9fa48("233") ? best / (1 + 1e-9) : (stryCov_9fa48("233"), best * (stryMutAct_9fa48("234") ? 1 - 1e-9 : (stryCov_9fa48("234"), 1 + 1e-9)))) + 1e-300)))) {
          if (stryMutAct_9fa48("235")) {
            {}
          } else {
            stryCov_9fa48("235");
            if (stryMutAct_9fa48("239") ? y >= best : stryMutAct_9fa48("238") ? y <= best : stryMutAct_9fa48("237") ? false : stryMutAct_9fa48("236") ? true : (stryCov_9fa48("236", "237", "238", "239"), y < best)) best = y;
            at = w;
          }
        }
      }
    }
    return at;
  }
}
function upperEnd(required: readonly RequiredLoading[], limitsPa: readonly number[]): number {
  if (stryMutAct_9fa48("240")) {
    {}
  } else {
    stryCov_9fa48("240");
    const finite = stryMutAct_9fa48("241") ? limitsPa : (stryCov_9fa48("241"), limitsPa.filter(stryMutAct_9fa48("242") ? () => undefined : (stryCov_9fa48("242"), w => stryMutAct_9fa48("245") ? Number.isFinite(w) || w > 0 : stryMutAct_9fa48("244") ? false : stryMutAct_9fa48("243") ? true : (stryCov_9fa48("243", "244", "245"), Number.isFinite(w) && (stryMutAct_9fa48("248") ? w <= 0 : stryMutAct_9fa48("247") ? w >= 0 : stryMutAct_9fa48("246") ? true : (stryCov_9fa48("246", "247", "248"), w > 0))))));
    if (stryMutAct_9fa48("252") ? finite.length <= 0 : stryMutAct_9fa48("251") ? finite.length >= 0 : stryMutAct_9fa48("250") ? false : stryMutAct_9fa48("249") ? true : (stryCov_9fa48("249", "250", "251", "252"), finite.length > 0)) return stryMutAct_9fa48("253") ? LIMIT_HEADROOM / Math.max(...finite) : (stryCov_9fa48("253"), LIMIT_HEADROOM * (stryMutAct_9fa48("254") ? Math.min(...finite) : (stryCov_9fa48("254"), Math.max(...finite))));
    const strict = lowestOnLogGrid(stryMutAct_9fa48("255") ? () => undefined : (stryCov_9fa48("255"), w => envelopeAt(required, w)), SEARCH_PA, 61);
    const lowest = Number.isFinite(strict) ? strict : lowestOnLogGrid(stryMutAct_9fa48("256") ? () => undefined : (stryCov_9fa48("256"), w => definedEnvelopeAt(required, w)), SEARCH_PA, 61);
    if (stryMutAct_9fa48("259") ? false : stryMutAct_9fa48("258") ? true : stryMutAct_9fa48("257") ? Number.isFinite(lowest) : (stryCov_9fa48("257", "258", "259"), !Number.isFinite(lowest))) return FALLBACK_UPPER_PA;
    return stryMutAct_9fa48("260") ? Math.max(Math.max(2 * lowest, 250), 20000) : (stryCov_9fa48("260"), Math.min(stryMutAct_9fa48("261") ? Math.min(2 * lowest, 250) : (stryCov_9fa48("261"), Math.max(stryMutAct_9fa48("262") ? 2 / lowest : (stryCov_9fa48("262"), 2 * lowest), 250)), 20000));
  }
}
function lowerEnd(required: readonly RequiredLoading[], hi: number): number {
  if (stryMutAct_9fa48("263")) {
    {}
  } else {
    stryCov_9fa48("263");
    const lo = stryMutAct_9fa48("264") ? LOWER_FRACTION / hi : (stryCov_9fa48("264"), LOWER_FRACTION * hi);
    const points = 81;
    const values = new Float64Array(points);
    let lowest = Infinity;
    for (let i = 0; stryMutAct_9fa48("267") ? i >= points : stryMutAct_9fa48("266") ? i <= points : stryMutAct_9fa48("265") ? false : (stryCov_9fa48("265", "266", "267"), i < points); stryMutAct_9fa48("268") ? i-- : (stryCov_9fa48("268"), i++)) {
      if (stryMutAct_9fa48("269")) {
        {}
      } else {
        stryCov_9fa48("269");
        values[i] = definedEnvelopeAt(required, stryMutAct_9fa48("270") ? lo - (hi - lo) * i / (points - 1) : (stryCov_9fa48("270"), lo + (stryMutAct_9fa48("271") ? (hi - lo) * i * (points - 1) : (stryCov_9fa48("271"), (stryMutAct_9fa48("272") ? (hi - lo) / i : (stryCov_9fa48("272"), (stryMutAct_9fa48("273") ? hi + lo : (stryCov_9fa48("273"), hi - lo)) * i)) / (stryMutAct_9fa48("274") ? points + 1 : (stryCov_9fa48("274"), points - 1))))));
        if (stryMutAct_9fa48("278") ? values[i] >= lowest : stryMutAct_9fa48("277") ? values[i] <= lowest : stryMutAct_9fa48("276") ? false : stryMutAct_9fa48("275") ? true : (stryCov_9fa48("275", "276", "277", "278"), values[i] < lowest)) lowest = values[i];
      }
    }
    if (stryMutAct_9fa48("281") ? !Number.isFinite(lowest) && lowest <= 0 : stryMutAct_9fa48("280") ? false : stryMutAct_9fa48("279") ? true : (stryCov_9fa48("279", "280", "281"), (stryMutAct_9fa48("282") ? Number.isFinite(lowest) : (stryCov_9fa48("282"), !Number.isFinite(lowest))) || (stryMutAct_9fa48("285") ? lowest > 0 : stryMutAct_9fa48("284") ? lowest < 0 : stryMutAct_9fa48("283") ? false : (stryCov_9fa48("283", "284", "285"), lowest <= 0)))) return lo;
    for (let i = 0; stryMutAct_9fa48("288") ? i >= points : stryMutAct_9fa48("287") ? i <= points : stryMutAct_9fa48("286") ? false : (stryCov_9fa48("286", "287", "288"), i < points); stryMutAct_9fa48("289") ? i-- : (stryCov_9fa48("289"), i++)) {
      if (stryMutAct_9fa48("290")) {
        {}
      } else {
        stryCov_9fa48("290");
        if (stryMutAct_9fa48("294") ? values[i] > STEEP_RATIO * lowest : stryMutAct_9fa48("293") ? values[i] < STEEP_RATIO * lowest : stryMutAct_9fa48("292") ? false : stryMutAct_9fa48("291") ? true : (stryCov_9fa48("291", "292", "293", "294"), values[i] <= (stryMutAct_9fa48("295") ? STEEP_RATIO / lowest : (stryCov_9fa48("295"), STEEP_RATIO * lowest)))) return stryMutAct_9fa48("296") ? lo - (hi - lo) * Math.max(0, i - 1) / (points - 1) : (stryCov_9fa48("296"), lo + (stryMutAct_9fa48("297") ? (hi - lo) * Math.max(0, i - 1) * (points - 1) : (stryCov_9fa48("297"), (stryMutAct_9fa48("298") ? (hi - lo) / Math.max(0, i - 1) : (stryCov_9fa48("298"), (stryMutAct_9fa48("299") ? hi + lo : (stryCov_9fa48("299"), hi - lo)) * (stryMutAct_9fa48("300") ? Math.min(0, i - 1) : (stryCov_9fa48("300"), Math.max(0, stryMutAct_9fa48("301") ? i + 1 : (stryCov_9fa48("301"), i - 1)))))) / (stryMutAct_9fa48("302") ? points + 1 : (stryCov_9fa48("302"), points - 1)))));
      }
    }
    return lo;
  }
}
function roundDown(x: number): number {
  if (stryMutAct_9fa48("303")) {
    {}
  } else {
    stryCov_9fa48("303");
    const unit = Math.pow(10, stryMutAct_9fa48("304") ? Math.floor(Math.log10(x)) + 1 : (stryCov_9fa48("304"), Math.floor(Math.log10(x)) - 1));
    return stryMutAct_9fa48("305") ? Math.floor(x / unit) / unit : (stryCov_9fa48("305"), Math.floor(stryMutAct_9fa48("306") ? x * unit : (stryCov_9fa48("306"), x / unit)) * unit);
  }
}
function roundUp(x: number): number {
  if (stryMutAct_9fa48("307")) {
    {}
  } else {
    stryCov_9fa48("307");
    const unit = Math.pow(10, stryMutAct_9fa48("308") ? Math.floor(Math.log10(x)) + 1 : (stryCov_9fa48("308"), Math.floor(Math.log10(x)) - 1));
    return stryMutAct_9fa48("309") ? Math.ceil(x / unit) / unit : (stryCov_9fa48("309"), Math.ceil(stryMutAct_9fa48("310") ? x * unit : (stryCov_9fa48("310"), x / unit)) * unit);
  }
}

/** [lo, hi] in Pa, finite and 0 < lo < hi. */
export function defaultWingLoadingRange(required: readonly RequiredLoading[], limitsPa: readonly number[], designPointPa?: number): [number, number] {
  if (stryMutAct_9fa48("311")) {
    {}
  } else {
    stryCov_9fa48("311");
    let hi = upperEnd(required, limitsPa);
    let lo = lowerEnd(required, hi);
    if (stryMutAct_9fa48("314") ? designPointPa !== undefined && Number.isFinite(designPointPa) || designPointPa > 0 : stryMutAct_9fa48("313") ? false : stryMutAct_9fa48("312") ? true : (stryCov_9fa48("312", "313", "314"), (stryMutAct_9fa48("316") ? designPointPa !== undefined || Number.isFinite(designPointPa) : stryMutAct_9fa48("315") ? true : (stryCov_9fa48("315", "316"), (stryMutAct_9fa48("318") ? designPointPa === undefined : stryMutAct_9fa48("317") ? true : (stryCov_9fa48("317", "318"), designPointPa !== undefined)) && Number.isFinite(designPointPa))) && (stryMutAct_9fa48("321") ? designPointPa <= 0 : stryMutAct_9fa48("320") ? designPointPa >= 0 : stryMutAct_9fa48("319") ? true : (stryCov_9fa48("319", "320", "321"), designPointPa > 0)))) {
      if (stryMutAct_9fa48("322")) {
        {}
      } else {
        stryCov_9fa48("322");
        hi = stryMutAct_9fa48("323") ? Math.min(hi, 1.1 * designPointPa) : (stryCov_9fa48("323"), Math.max(hi, stryMutAct_9fa48("324") ? 1.1 / designPointPa : (stryCov_9fa48("324"), 1.1 * designPointPa)));
        lo = stryMutAct_9fa48("325") ? Math.max(lo, 0.9 * designPointPa) : (stryCov_9fa48("325"), Math.min(lo, stryMutAct_9fa48("326") ? 0.9 / designPointPa : (stryCov_9fa48("326"), 0.9 * designPointPa)));
      }
    }
    return stryMutAct_9fa48("327") ? [] : (stryCov_9fa48("327"), [roundDown(lo), roundUp(hi)]);
  }
}