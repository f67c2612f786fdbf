// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { checkPrintRequest, lockedReport, MAX_REPORT_HTML_BYTES, PRINT_POLICY } from '../../app/shared/print-request';
import { buildReport } from '../../app/report/report';
import { studied, withTypicalRanges } from '../chart/study-fixture';

const DOC = '<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n</head>\n<body>x</body>\n</html>';

describe('checkPrintRequest', () => {
  it('accepts the design-review report as buildReport writes it', () => {
    const s = studied(withTypicalRanges('trainer', { samples: 200 }));
    const html = buildReport({ concept: s.concept, design: s.design, evaluation: s.evaluation, system: 'si', studies: { samples: 200 } });
    const checked = checkPrintRequest({ html });
    expect(checked.ok).toBe(true);
    if (checked.ok) expect(checked.html.length).toBeGreaterThan(html.length);
  });

  it.each([
    [undefined, '(request)'],
    [[DOC], '(request)'],
    [{}, 'html'],
    [{ html: '' }, 'html'],
    [{ html: DOC, baseUrl: 'file:///' }, 'baseUrl'],
    [{ html: '<p>text</p>' }, 'html'],
    [{ html: `<script>1</script>${DOC}` }, 'html'],
    [{ html: DOC.replace('<head>', '<body></body><head>') }, 'html'],
  ])('refuses %j naming %s', (payload, field) => {
    const checked = checkPrintRequest(payload);
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.field).toBe(field);
  });

  // A meta refresh navigates without any script (WHATWG HTML, "refresh" pragma), written plainly or with character references.
  it.each([
    '<meta http-equiv="refresh" content="0;url=file:///etc/passwd">',
    "<meta http-equiv='Refresh' content='0;url=file:///etc/passwd'>",
    '<meta http-equiv=refresh content="0;url=file:///etc/passwd">',
    '<meta HTTP-EQUIV = "&#114;efresh" content="0;url=file:///etc/passwd">',
  ])('refuses a document that sets %s', (meta) => {
    const checked = checkPrintRequest({ html: DOC.replace('<meta charset="utf-8">', `<meta charset="utf-8">${meta}`) });
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.message).toContain('http-equiv');
  });

  it('refuses a document over the size limit, in bytes of UTF-8', () => {
    // "Ω" is two bytes in UTF-8 (RFC 3629).
    const padding = 'Ω'.repeat(MAX_REPORT_HTML_BYTES / 2);
    const checked = checkPrintRequest({ html: DOC.replace('x', padding) });
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.message).toContain('MB');
  });
});

describe('lockedReport', () => {
  it('puts the print policy first in the head, ahead of the document’s own tags', () => {
    const locked = lockedReport(`\uFEFF${DOC}`);
    const head = locked.slice(locked.indexOf('<head>') + '<head>'.length).trimStart();
    expect(head.startsWith(`<meta http-equiv="Content-Security-Policy" content="${PRINT_POLICY}">`)).toBe(true);
    expect(locked.endsWith('<body>x</body>\n</html>')).toBe(true);
  });

  it('allows no scripts, frames, connections or outside images', () => {
    // Directives fall back to default-src (W3C Content Security Policy Level 3, section 6.1).
    expect(PRINT_POLICY).toContain("default-src 'none'");
    expect(PRINT_POLICY).not.toMatch(/script-src|frame-src|connect-src|file:|https?:/);
  });

  it('refuses text that is not a whole document', () => {
    expect(() => lockedReport('<p>hi</p>')).toThrow(RangeError);
  });
});
