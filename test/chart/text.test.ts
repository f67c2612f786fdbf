// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import { escapeXml, formatDisplayed, shorten, wrapText } from '../../app/chart/text';

// jsdom's DOMParser, an XML parser from outside the project.
const parser = new DOMParser();

describe('escapeXml', () => {
  it('escapes the five XML special characters (XML 1.0, section 2.4)', () => {
    expect(escapeXml(`<a & "b" 'c'>`)).toBe('&lt;a &amp; &quot;b&quot; &apos;c&apos;&gt;');
  });

  it('drops characters XML 1.0 does not allow, so the document stays well-formed', () => {
    const nasty = 'Trainer\u0001 <script>alert("x")</script> & \uD800 ]]> ✈';
    const doc = parser.parseFromString(`<r a="${escapeXml(nasty)}">${escapeXml(nasty)}</r>`, 'application/xml');
    expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
    expect(doc.documentElement.textContent).toBe('Trainer <script>alert("x")</script> &  ]]> ✈');
    expect(doc.documentElement.getAttribute('a')).toBe(doc.documentElement.textContent);
  });

  it('drops each forbidden character even where nothing else needs escaping, and leaves plain text as it is', () => {
    // XML 1.0, section 2.2 (Char): tab, LF and CR are allowed; other C0 controls, lone surrogates, U+FFFE and U+FFFF are not.
    for (const forbidden of ['\u0000', '\u0008', '\u000B', '\u001F', '\uD800', '\uDFFF', '\uFFFE', '\uFFFF']) expect(escapeXml(`a${forbidden}b`)).toBe('ab');
    for (const allowed of ['\t', '\n', '\r', '\u007F', 'é', '✈', '\uD83D\uDE80']) expect(escapeXml(`a${allowed}b`)).toBe(`a${allowed}b`);
    const path = 'M82.5,466.1L90.25,460.7L98,455.4';
    expect(escapeXml(path)).toBe(path);
  });
});

describe('shorten', () => {
  it('leaves short text alone and cuts long text with an ellipsis', () => {
    expect(shorten('Cruise', 10)).toBe('Cruise');
    expect(shorten('Cruise at 6000 ft and 110 kt', 12)).toBe('Cruise at 6…');
    expect([...shorten('Cruise at 6000 ft and 110 kt', 12)]).toHaveLength(12);
  });
});

describe('wrapText', () => {
  it('fills lines up to the width and ends a cut text with an ellipsis', () => {
    const text = 'AEO climb gradient 8.3 % at sea level, take-off flaps (14 CFR 23.65(a))';
    expect(wrapText(text, 30)).toEqual(['AEO climb gradient 8.3 % at', 'sea level, take-off flaps (14', 'CFR 23.65(a))']);
    const two = wrapText(text, 30, 2);
    expect(two).toHaveLength(2);
    expect(two[1].endsWith('…')).toBe(true);
    expect(two.every((line) => [...line].length <= 30)).toBe(true);
  });
});

describe('formatDisplayed', () => {
  it('writes the unit and the usual digits, never NaN', () => {
    expect(formatDisplayed(1108.4, 'wingLoading', 'si')).toBe('1,108 N/m²');
    expect(formatDisplayed(0.31234, 'thrustToWeight', 'si')).toBe('0.312');
    expect(formatDisplayed(NaN, 'wingLoading', 'si')).toBe('—');
  });
});
