// @ts-nocheck
import { EventEmitter } from 'node:events';
import { describe, expect, it, vi } from 'vitest';
import { isAllowedRequest, isOwnPage, lockSession, lockWebContents } from '../../app/main/security';

vi.mock('electron', () => ({}));

const page = 'file:///opt/loftpoint/out/renderer/index.html';

describe('isOwnPage and isAllowedRequest', () => {
  it.each([
    [page, true],
    [`${page}#history`, true],
    ['file:///etc/passwd', false],
    ['https://example.com/', false],
    ['javascript:alert(1)', false],
    ['not a url', false],
  ])('navigation to %s allowed: %s', (url, allowed) => {
    expect(isOwnPage(url, page)).toBe(allowed);
  });

  it.each([
    ['file:///opt/loftpoint/out/renderer/assets/index-1.js', true],
    ['file:///opt/loftpoint/out/renderer/favicon.svg', true],
    ['data:image/svg+xml,<svg/>', true],
    ['devtools://devtools/bundled/inspector.html', true],
    ['file:///opt/loftpoint/out/main/index.js', false],
    ['file:///home/ada/.ssh/id_rsa', false],
    ['https://cdn.example.com/font.woff2', false],
    ['http://127.0.0.1:8080/api/getProject', false],
  ])('request to %s allowed: %s', (url, allowed) => {
    expect(isAllowedRequest(url, page)).toBe(allowed);
  });

  it('allows the dev server, and only it, during development', () => {
    expect(isOwnPage('http://localhost:5173/', 'http://localhost:5173/')).toBe(true);
    expect(isAllowedRequest('http://localhost:5173/src/main.ts', 'http://localhost:5173/')).toBe(true);
    expect(isAllowedRequest('http://localhost:5174/x', 'http://localhost:5173/')).toBe(false);
  });
});

describe('lockWebContents', () => {
  it('stops navigation away, webviews and new windows', () => {
    const contents = Object.assign(new EventEmitter(), { setWindowOpenHandler: vi.fn() });
    lockWebContents(contents as never, page);
    const away = { preventDefault: vi.fn() };
    contents.emit('will-navigate', away, 'https://example.com/');
    expect(away.preventDefault).toHaveBeenCalled();
    const reload = { preventDefault: vi.fn() };
    contents.emit('will-navigate', reload, page);
    expect(reload.preventDefault).not.toHaveBeenCalled();
    const webview = { preventDefault: vi.fn() };
    contents.emit('will-attach-webview', webview);
    expect(webview.preventDefault).toHaveBeenCalled();
    const opener = contents.setWindowOpenHandler.mock.calls[0][0] as () => { action: string };
    expect(opener()).toEqual({ action: 'deny' });
  });
});

describe('lockSession', () => {
  it('denies every permission and cancels foreign requests', () => {
    let onRequest: (details: { url: string }, callback: (answer: { cancel: boolean }) => void) => void = () => {};
    const session = {
      setPermissionRequestHandler: vi.fn(),
      setPermissionCheckHandler: vi.fn(),
      webRequest: { onBeforeRequest: vi.fn((handler) => (onRequest = handler)) },
    };
    lockSession(session as never, page);
    const permission = vi.fn();
    session.setPermissionRequestHandler.mock.calls[0][0]({}, 'geolocation', permission);
    expect(permission).toHaveBeenCalledWith(false);
    expect(session.setPermissionCheckHandler.mock.calls[0][0]()).toBe(false);
    const answers: boolean[] = [];
    onRequest({ url: 'https://tracker.example/pixel.gif' }, (answer) => answers.push(answer.cancel));
    onRequest({ url: 'file:///opt/loftpoint/out/renderer/assets/a.css' }, (answer) => answers.push(answer.cancel));
    expect(answers).toEqual([true, false]);
  });
});

describe('the page on its own protocol', () => {
  const own = 'loftpoint://app/index.html';
  it.each([
    ['loftpoint://app/index.html', true],
    ['loftpoint://app/index.html#history', true],
    ['loftpoint://app/other.html', false],
    ['loftpoint://evil/index.html', false],
    ['file:///opt/loftpoint/out/renderer/index.html', false],
    ['https://example.com/index.html', false],
  ])('isOwnPage(%s) is %s', (url, allowed) => {
    expect(isOwnPage(url, own)).toBe(allowed);
  });

  it.each([
    ['loftpoint://app/assets/index-1.js', true],
    ['loftpoint://app/favicon.svg', true],
    ['loftpoint://evil/x.js', false],
    ['file:///etc/passwd', false],
    ['http://127.0.0.1:8080/', false],
  ])('isAllowedRequest(%s) is %s', (url, allowed) => {
    expect(isAllowedRequest(url, own)).toBe(allowed);
  });
});
