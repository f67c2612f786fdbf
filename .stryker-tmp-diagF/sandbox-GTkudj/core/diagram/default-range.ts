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
const FALLBACK_UPPER_PA = stryMutAct_9fa48("8") ? 150 / PSF_PA : (stryCov_9fa48("8"), 150 * PSF_PA);
const SEARCH_PA: [number, number] = stryMutAct_9fa48("9") ? [] : (stryCov_9fa48("9"), [50, 10000]);

/** Wing loading at which f is lowest on a log grid, ties to the largest; NaN when f is never finite. */
function lowestOnLogGrid(f: (w: number) => number, [lo, hi]: [number, number], points: number): number {
  if (stryMutAct_9fa48("10")) {
    {}
  } else {
    stryCov_9fa48("10");
    let best = Infinity;
    let at = NaN;
    for (let i = 0; stryMutAct_9fa48("13") ? i >= points : stryMutAct_9fa48("12") ? i <= points : stryMutAct_9fa48("11") ? false : (stryCov_9fa48("11", "12", "13"), i < points); stryMutAct_9fa48("14") ? i-- : (stryCov_9fa48("14"), i++)) {
      if (stryMutAct_9fa48("15")) {
        {}
      } else {
        stryCov_9fa48("15");
        const w = stryMutAct_9fa48("16") ? lo / Math.pow(hi / lo, i / (points - 1)) : (stryCov_9fa48("16"), lo * Math.pow(stryMutAct_9fa48("17") ? hi * lo : (stryCov_9fa48("17"), hi / lo), stryMutAct_9fa48("18") ? i * (points - 1) : (stryCov_9fa48("18"), i / (stryMutAct_9fa48("19") ? points + 1 : (stryCov_9fa48("19"), points - 1)))));
        const y = f(w);
        if (stryMutAct_9fa48("23") ? y > best * (1 + 1e-9) + 1e-300 : stryMutAct_9fa48("22") ? y < best * (1 + 1e-9) + 1e-300 : stryMutAct_9fa48("21") ? false : stryMutAct_9fa48("20") ? true : (stryCov_9fa48("20", "21", "22", "23"), y <= (stryMutAct_9fa48("24") ? best * (1 + 1e-9) - 1e-300 : (stryCov_9fa48("24"), (stryMutAct_9fa48("25") ? best / (1 + 1e-9) : (stryCov_9fa48("25"), best * (stryMutAct_9fa48("26") ? 1 - 1e-9 : (stryCov_9fa48("26"), 1 + 1e-9)))) + 1e-300)))) {
          if (stryMutAct_9fa48("27")) {
            {}
          } else {
            stryCov_9fa48("27");
            if (stryMutAct_9fa48("31") ? y >= best : stryMutAct_9fa48("30") ? y <= best : stryMutAct_9fa48("29") ? false : stryMutAct_9fa48("28") ? true : (stryCov_9fa48("28", "29", "30", "31"), y < best)) best = y;
            at = w;
          }
        }
      }
    }
    return at;
  }
}
function upperEnd(required: readonly RequiredLoading[], limitsPa: readonly number[]): number {
  if (stryMutAct_9fa48("32")) {
    {}
  } else {
    stryCov_9fa48("32");
    const finite = stryMutAct_9fa48("33") ? limitsPa : (stryCov_9fa48("33"), limitsPa.filter(stryMutAct_9fa48("34") ? () => undefined : (stryCov_9fa48("34"), w => stryMutAct_9fa48("37") ? Number.isFinite(w) || w > 0 : stryMutAct_9fa48("36") ? false : stryMutAct_9fa48("35") ? true : (stryCov_9fa48("35", "36", "37"), Number.isFinite(w) && (stryMutAct_9fa48("40") ? w <= 0 : stryMutAct_9fa48("39") ? w >= 0 : stryMutAct_9fa48("38") ? true : (stryCov_9fa48("38", "39", "40"), w > 0))))));
    if (stryMutAct_9fa48("44") ? finite.length <= 0 : stryMutAct_9fa48("43") ? finite.length >= 0 : stryMutAct_9fa48("42") ? false : stryMutAct_9fa48("41") ? true : (stryCov_9fa48("41", "42", "43", "44"), finite.length > 0)) return stryMutAct_9fa48("45") ? LIMIT_HEADROOM / Math.max(...finite) : (stryCov_9fa48("45"), LIMIT_HEADROOM * (stryMutAct_9fa48("46") ? Math.min(...finite) : (stryCov_9fa48("46"), Math.max(...finite))));
    const strict = lowestOnLogGrid(stryMutAct_9fa48("47") ? () => undefined : (stryCov_9fa48("47"), w => envelopeAt(required, w)), SEARCH_PA, 61);
    const lowest = Number.isFinite(strict) ? strict : lowestOnLogGrid(stryMutAct_9fa48("48") ? () => undefined : (stryCov_9fa48("48"), w => definedEnvelopeAt(required, w)), SEARCH_PA, 61);
    if (stryMutAct_9fa48("51") ? false : stryMutAct_9fa48("50") ? true : stryMutAct_9fa48("49") ? Number.isFinite(lowest) : (stryCov_9fa48("49", "50", "51"), !Number.isFinite(lowest))) return FALLBACK_UPPER_PA;
    return stryMutAct_9fa48("52") ? Math.max(Math.max(2 * lowest, 250), 20000) : (stryCov_9fa48("52"), Math.min(stryMutAct_9fa48("53") ? Math.min(2 * lowest, 250) : (stryCov_9fa48("53"), Math.max(stryMutAct_9fa48("54") ? 2 / lowest : (stryCov_9fa48("54"), 2 * lowest), 250)), 20000));
  }
}
function lowerEnd(required: readonly RequiredLoading[], hi: number): number {
  if (stryMutAct_9fa48("55")) {
    {}
  } else {
    stryCov_9fa48("55");
    const lo = stryMutAct_9fa48("56") ? LOWER_FRACTION / hi : (stryCov_9fa48("56"), LOWER_FRACTION * hi);
    const points = 81;
    const values = new Float64Array(points);
    let lowest = Infinity;
    for (let i = 0; stryMutAct_9fa48("59") ? i >= points : stryMutAct_9fa48("58") ? i <= points : stryMutAct_9fa48("57") ? false : (stryCov_9fa48("57", "58", "59"), i < points); stryMutAct_9fa48("60") ? i-- : (stryCov_9fa48("60"), i++)) {
      if (stryMutAct_9fa48("61")) {
        {}
      } else {
        stryCov_9fa48("61");
        values[i] = definedEnvelopeAt(required, stryMutAct_9fa48("62") ? lo - (hi - lo) * i / (points - 1) : (stryCov_9fa48("62"), lo + (stryMutAct_9fa48("63") ? (hi - lo) * i * (points - 1) : (stryCov_9fa48("63"), (stryMutAct_9fa48("64") ? (hi - lo) / i : (stryCov_9fa48("64"), (stryMutAct_9fa48("65") ? hi + lo : (stryCov_9fa48("65"), hi - lo)) * i)) / (stryMutAct_9fa48("66") ? points + 1 : (stryCov_9fa48("66"), points - 1))))));
        if (stryMutAct_9fa48("70") ? values[i] >= lowest : stryMutAct_9fa48("69") ? values[i] <= lowest : stryMutAct_9fa48("68") ? false : stryMutAct_9fa48("67") ? true : (stryCov_9fa48("67", "68", "69", "70"), values[i] < lowest)) lowest = values[i];
      }
    }
    if (stryMutAct_9fa48("73") ? !Number.isFinite(lowest) && lowest <= 0 : stryMutAct_9fa48("72") ? false : stryMutAct_9fa48("71") ? true : (stryCov_9fa48("71", "72", "73"), (stryMutAct_9fa48("74") ? Number.isFinite(lowest) : (stryCov_9fa48("74"), !Number.isFinite(lowest))) || (stryMutAct_9fa48("77") ? lowest > 0 : stryMutAct_9fa48("76") ? lowest < 0 : stryMutAct_9fa48("75") ? false : (stryCov_9fa48("75", "76", "77"), lowest <= 0)))) return lo;
    for (let i = 0; stryMutAct_9fa48("80") ? i >= points : stryMutAct_9fa48("79") ? i <= points : stryMutAct_9fa48("78") ? false : (stryCov_9fa48("78", "79", "80"), i < points); stryMutAct_9fa48("81") ? i-- : (stryCov_9fa48("81"), i++)) {
      if (stryMutAct_9fa48("82")) {
        {}
      } else {
        stryCov_9fa48("82");
        if (stryMutAct_9fa48("86") ? values[i] > STEEP_RATIO * lowest : stryMutAct_9fa48("85") ? values[i] < STEEP_RATIO * lowest : stryMutAct_9fa48("84") ? false : stryMutAct_9fa48("83") ? true : (stryCov_9fa48("83", "84", "85", "86"), values[i] <= (stryMutAct_9fa48("87") ? STEEP_RATIO / lowest : (stryCov_9fa48("87"), STEEP_RATIO * lowest)))) return stryMutAct_9fa48("88") ? lo - (hi - lo) * Math.max(0, i - 1) / (points - 1) : (stryCov_9fa48("88"), lo + (stryMutAct_9fa48("89") ? (hi - lo) * Math.max(0, i - 1) * (points - 1) : (stryCov_9fa48("89"), (stryMutAct_9fa48("90") ? (hi - lo) / Math.max(0, i - 1) : (stryCov_9fa48("90"), (stryMutAct_9fa48("91") ? hi + lo : (stryCov_9fa48("91"), hi - lo)) * (stryMutAct_9fa48("92") ? Math.min(0, i - 1) : (stryCov_9fa48("92"), Math.max(0, stryMutAct_9fa48("93") ? i + 1 : (stryCov_9fa48("93"), i - 1)))))) / (stryMutAct_9fa48("94") ? points + 1 : (stryCov_9fa48("94"), points - 1)))));
      }
    }
    return lo;
  }
}
function roundDown(x: number): number {
  if (stryMutAct_9fa48("95")) {
    {}
  } else {
    stryCov_9fa48("95");
    const unit = Math.pow(10, stryMutAct_9fa48("96") ? Math.floor(Math.log10(x)) + 1 : (stryCov_9fa48("96"), Math.floor(Math.log10(x)) - 1));
    return stryMutAct_9fa48("97") ? Math.floor(x / unit) / unit : (stryCov_9fa48("97"), Math.floor(stryMutAct_9fa48("98") ? x * unit : (stryCov_9fa48("98"), x / unit)) * unit);
  }
}
function roundUp(x: number): number {
  if (stryMutAct_9fa48("99")) {
    {}
  } else {
    stryCov_9fa48("99");
    const unit = Math.pow(10, stryMutAct_9fa48("100") ? Math.floor(Math.log10(x)) + 1 : (stryCov_9fa48("100"), Math.floor(Math.log10(x)) - 1));
    return stryMutAct_9fa48("101") ? Math.ceil(x / unit) / unit : (stryCov_9fa48("101"), Math.ceil(stryMutAct_9fa48("102") ? x * unit : (stryCov_9fa48("102"), x / unit)) * unit);
  }
}

/** [lo, hi] in Pa, finite and 0 < lo < hi. */
export function defaultWingLoadingRange(required: readonly RequiredLoading[], limitsPa: readonly number[], designPointPa?: number): [number, number] {
  if (stryMutAct_9fa48("103")) {
    {}
  } else {
    stryCov_9fa48("103");
    let hi = upperEnd(required, limitsPa);
    let lo = lowerEnd(required, hi);
    if (stryMutAct_9fa48("106") ? designPointPa !== undefined && Number.isFinite(designPointPa) || designPointPa > 0 : stryMutAct_9fa48("105") ? false : stryMutAct_9fa48("104") ? true : (stryCov_9fa48("104", "105", "106"), (stryMutAct_9fa48("108") ? designPointPa !== undefined || Number.isFinite(designPointPa) : stryMutAct_9fa48("107") ? true : (stryCov_9fa48("107", "108"), (stryMutAct_9fa48("110") ? designPointPa === undefined : stryMutAct_9fa48("109") ? true : (stryCov_9fa48("109", "110"), designPointPa !== undefined)) && Number.isFinite(designPointPa))) && (stryMutAct_9fa48("113") ? designPointPa <= 0 : stryMutAct_9fa48("112") ? designPointPa >= 0 : stryMutAct_9fa48("111") ? true : (stryCov_9fa48("111", "112", "113"), designPointPa > 0)))) {
      if (stryMutAct_9fa48("114")) {
        {}
      } else {
        stryCov_9fa48("114");
        hi = stryMutAct_9fa48("115") ? Math.min(hi, 1.1 * designPointPa) : (stryCov_9fa48("115"), Math.max(hi, stryMutAct_9fa48("116") ? 1.1 / designPointPa : (stryCov_9fa48("116"), 1.1 * designPointPa)));
        lo = stryMutAct_9fa48("117") ? Math.max(lo, 0.9 * designPointPa) : (stryCov_9fa48("117"), Math.min(lo, stryMutAct_9fa48("118") ? 0.9 / designPointPa : (stryCov_9fa48("118"), 0.9 * designPointPa)));
      }
    }
    return stryMutAct_9fa48("119") ? [] : (stryCov_9fa48("119"), [roundDown(lo), roundUp(hi)]);
  }
}