/**
 * The page's one way to the service: `window.api` in the desktop window
 * (set by the preload), HTTP to the browser-mode server otherwise. Both give
 * the same typed methods and the same result values.
 */
import { SERVICE_METHODS, type RemoteService, type ServiceMethod, type ServiceResult } from '../../../shared/contract';
import type { DesktopApi, ExportFileRequest, WindowCommand, WindowStateReport } from '../../../shared/desktop-api';
import { EXPORT_KINDS } from '../../../shared/desktop-api';
import { PRINT_PDF_PATH } from '../../../shared/print-request';
import { base64ToBytes } from '../export/base64';
import { endEarlyRequests, postService, takeEarlyRequest, TOKEN_HEADER, TOKEN_IN_FRAGMENT, TOKEN_KEY } from './early-requests';

export { TOKEN_HEADER };

/** Takes an answer sent ahead for a call (method, JSON body) if there is one (early-requests.ts). */
export type EarlyAnswers = (method: string, body: string) => Promise<Response> | undefined;

export interface Connection {
  mode: 'desktop' | 'browser' | 'offline';
  service: RemoteService | null;
  /** Why there is no service, for the status line. */
  problem?: string;
  onCommand(listener: (command: WindowCommand) => void): () => void;
  /** Writes a file: a save dialog in the desktop window, a download in the browser. */
  exportFile(request: ExportFileRequest): Promise<string | null>;
  /** A design-review report's HTML printed to PDF by the shell; throws an Error with a message to show. */
  printPdf(html: string): Promise<Uint8Array>;
  /** Tells the desktop shell the page's units and unsaved state; nothing to tell elsewhere. */
  reportWindowState?(state: WindowStateReport): void;
  /** Browser mode: unsaved drafts kept by the server per project file, so a restart on a new port still offers them. */
  drafts?: DraftMirror;
  /** Browser mode: the window's first start is over, so answers sent ahead for it are no longer taken. */
  endFirstStart?(): void;
}

export interface DraftMirror {
  /** The drafts the server kept for the open project, by concept name; {} when none or unreachable. */
  load(): Promise<Record<string, unknown>>;
  /** Replaces them; failures are quiet (the draft stays in the page). */
  save(drafts: Record<string, unknown>): Promise<void>;
}

/** One call over HTTP: the answer sent ahead for it when there is one (early-requests.ts), else a POST with the launch token. */
function postCall(fetcher: typeof fetch, token: string, early: EarlyAnswers, method: string, body: string): Promise<Response> {
  return early(method, body) ?? postService(fetcher, token, method, body);
}

export function httpDrafts(token: string, fetcher: typeof fetch = fetch, early: EarlyAnswers = takeEarlyRequest): DraftMirror {
  const post = async (method: string, request: unknown): Promise<unknown> => {
    const body = JSON.stringify(request);
    const response = await postCall(fetcher, token, early, method, body);
    return response.json();
  };
  return {
    async load() {
      try {
        const result = (await post('keptDrafts', {})) as { ok?: boolean; value?: unknown };
        return result.ok && result.value && typeof result.value === 'object' ? (result.value as Record<string, unknown>) : {};
      } catch {
        return {};
      }
    },
    async save(drafts) {
      try {
        await post('keepDrafts', { drafts });
      } catch {
        // The server is away: the draft stays in the page and its storage.
      }
    },
  };
}

declare global {
  interface Window {
    api?: DesktopApi;
  }
}

/** Takes the token from the address fragment once, keeps it for reloads of this tab, and clears it from the address bar. */
export function launchToken(location: Location, storage: Storage, history: History): string | null {
  const match = TOKEN_IN_FRAGMENT.exec(location.hash);
  if (match) {
    storage.setItem(TOKEN_KEY, match[1]);
    history.replaceState(null, '', location.pathname + location.search);
    return match[1];
  }
  return storage.getItem(TOKEN_KEY);
}

export function httpService(token: string, fetcher: typeof fetch = fetch, early: EarlyAnswers = takeEarlyRequest): RemoteService {
  const call = async (method: ServiceMethod, request: unknown): Promise<ServiceResult<unknown>> => {
    let response: Response;
    const body = JSON.stringify(request ?? {});
    try {
      response = await postCall(fetcher, token, early, method, body);
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

const PDF_SIGNATURE = '%PDF-';

function isPdf(bytes: Uint8Array): boolean {
  return bytes.length > PDF_SIGNATURE.length && String.fromCharCode(...bytes.subarray(0, PDF_SIGNATURE.length)) === PDF_SIGNATURE;
}

/** Browser mode: the server prints with its Chromium, behind the same token and origin checks as the service. */
export function httpPrinter(token: string, fetcher: typeof fetch = fetch): (html: string) => Promise<Uint8Array> {
  return async (html) => {
    let response: Response;
    try {
      response = await fetcher(`.${PRINT_PDF_PATH}`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', [TOKEN_HEADER]: token },
        body: JSON.stringify({ html }),
        credentials: 'same-origin',
        cache: 'no-store',
      });
    } catch {
      throw new Error('the Loftpoint server is not answering; is `loftpoint serve` still running?');
    }
    if ((response.headers.get('Content-Type') ?? '').startsWith('application/pdf')) {
      const bytes = new Uint8Array(await response.arrayBuffer());
      if (response.ok && isPdf(bytes)) return bytes;
      throw new Error('the server answered with a damaged PDF');
    }
    let message = `the server answered ${response.status} without a PDF`;
    try {
      const result = (await response.json()) as { error?: { message?: unknown } };
      if (typeof result.error?.message === 'string') message = result.error.message;
    } catch {
      // The status line is all there is.
    }
    throw new Error(message);
  };
}

/** The bytes a request stands for: its text, or its base64 decoded. */
export function exportBytes(request: ExportFileRequest): BlobPart {
  return request.encoding === 'base64' ? base64ToBytes(request.content) : request.content;
}

function download(request: ExportFileRequest): string {
  const blob = new Blob([exportBytes(request)], { type: EXPORT_KINDS[request.kind].mime });
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
      reportWindowState: (state) => desktop.reportWindowState?.(state),
      exportFile: async (request) => {
        const result = await desktop.exportFile(request);
        if (!result.ok) throw new Error(result.error.message);
        return result.value ? result.value.file : null;
      },
      printPdf: async (html) => {
        const result = await desktop.printPdf({ html });
        if (!result.ok) throw new Error(result.error.message);
        if (!isPdf(result.value)) throw new Error('the desktop shell answered with a damaged PDF');
        return result.value;
      },
    };
  }
  const noPrinter = async (): Promise<Uint8Array> => {
    throw new Error('PDF needs the Loftpoint desktop window or `loftpoint serve`; export the HTML report and print it from the browser instead');
  };
  const local = { onCommand: () => () => {}, reportWindowState: () => {}, exportFile: async (request: ExportFileRequest) => download(request), printPdf: noPrinter };
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
  return { mode: 'browser', service: httpService(token), ...local, printPdf: httpPrinter(token), drafts: httpDrafts(token), endFirstStart: endEarlyRequests };
}
