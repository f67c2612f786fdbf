/**
 * The page's one way to the service: `window.api` in the desktop window
 * (set by the preload), HTTP to the browser-mode server otherwise. Both give
 * the same typed methods and the same result values.
 */
import { SERVICE_METHODS, type RemoteService, type ServiceMethod, type ServiceResult } from '../../../service/contract';
import type { DesktopApi, ExportFileRequest, WindowCommand } from '../../../shared/desktop-api';
import { EXPORT_KINDS } from '../../../shared/desktop-api';

export const TOKEN_HEADER = 'X-Loftpoint-Token';
const TOKEN_KEY = 'loftpoint.token';

export interface Connection {
  mode: 'desktop' | 'browser' | 'offline';
  service: RemoteService | null;
  /** Why there is no service, for the status line. */
  problem?: string;
  onCommand(listener: (command: WindowCommand) => void): () => void;
  /** Writes a file: a save dialog in the desktop window, a download in the browser. */
  exportFile(request: ExportFileRequest): Promise<string | null>;
}

declare global {
  interface Window {
    api?: DesktopApi;
  }
}

/** Takes the token from the address fragment once, keeps it for reloads of this tab, and clears it from the address bar. */
export function launchToken(location: Location, storage: Storage, history: History): string | null {
  const match = /(?:^#|&)token=([A-Za-z0-9_-]+)/.exec(location.hash);
  if (match) {
    storage.setItem(TOKEN_KEY, match[1]);
    history.replaceState(null, '', location.pathname + location.search);
    return match[1];
  }
  return storage.getItem(TOKEN_KEY);
}

export function httpService(token: string, fetcher: typeof fetch = fetch): RemoteService {
  const call = async (method: ServiceMethod, request: unknown): Promise<ServiceResult<unknown>> => {
    let response: Response;
    try {
      response = await fetcher(`./api/${method}`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', [TOKEN_HEADER]: token },
        body: JSON.stringify(request ?? {}),
        credentials: 'same-origin',
        cache: 'no-store',
      });
    } catch {
      return { ok: false, error: { code: 'io', message: 'The Loftpoint server is not answering; is `loftpoint serve` still running?' } };
    }
    try {
      return (await response.json()) as ServiceResult<unknown>;
    } catch {
      return { ok: false, error: { code: 'internal', message: `The server answered ${response.status} without a result` } };
    }
  };
  return Object.fromEntries(SERVICE_METHODS.map((method) => [method, (request: unknown) => call(method, request)])) as RemoteService;
}

function download(request: ExportFileRequest): string {
  const blob = new Blob([request.content], { type: EXPORT_KINDS[request.kind].mime });
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = request.suggestedName;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
  return request.suggestedName;
}

export function connect(): Connection {
  const desktop = window.api;
  if (desktop) {
    return {
      mode: 'desktop',
      service: desktop,
      onCommand: (listener) => desktop.onCommand(listener),
      exportFile: async (request) => {
        const result = await desktop.exportFile(request);
        if (!result.ok) throw new Error(result.error.message);
        return result.value ? result.value.file : null;
      },
    };
  }
  const local = { onCommand: () => () => {}, exportFile: async (request: ExportFileRequest) => download(request) };
  if (location.protocol !== 'http:') {
    return { mode: 'offline', service: null, problem: 'No project is open: this page was opened without its server.', ...local };
  }
  const token = launchToken(location, sessionStorage, history);
  if (!token) {
    return {
      mode: 'offline',
      service: null,
      problem: 'No access token: open the full address that `loftpoint serve` printed (it ends in #token=…).',
      ...local,
    };
  }
  return { mode: 'browser', service: httpService(token), ...local };
}
