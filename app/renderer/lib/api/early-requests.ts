/**
 * Browser mode's first service calls, sent the moment the page's HTML has
 * arrived instead of once the window's script is downloaded, parsed and run.
 * The page loads this small module on its own, first (the Vite build puts it
 * in index.html as an async module, app/renderer/vite.config.ts), and it posts
 * what the window starts with: getProject, keptDrafts and listConcepts, then,
 * with their answers, listVersions of the concept that opens first and
 * getVersion of its newest version.
 *
 * The window's own calls (client.ts) take an answer from here when one was
 * sent for the very same method and body, each at most once, and only during
 * the window's first start (`endEarlyRequests`); any other call goes out as
 * usual. So nothing is asked twice, and every answer is the one the window
 * would have had from its own call. Nothing is sent in the desktop window
 * (its service is `window.api`), without a server, or without a token.
 *
 * No runtime imports: this module is fetched alone, before everything else.
 */

/** The header that carries the launch token on every API call. */
export const TOKEN_HEADER = 'X-Loftpoint-Token';
/** Where a tab keeps its token for reloads (sessionStorage). */
export const TOKEN_KEY = 'loftpoint.token';
/** The token in the address fragment that `loftpoint serve` prints. */
export const TOKEN_IN_FRAGMENT = /(?:^#|&)token=([A-Za-z0-9_-]+)/;

/** The localStorage key of the concept last worked on in a project file. */
export function rememberedConceptKey(projectFile: string): string {
  return `loftpoint.concept:${projectFile}`;
}

/** The concept a window opens first: the one remembered, else the first with a saved version. */
export function conceptToOpen<C extends { name: string; latestVersion: number | null }>(concepts: readonly C[], remembered: string | null): C | undefined {
  return concepts.find((concept) => concept.name === remembered) ?? concepts.find((concept) => concept.latestVersion !== null);
}

/** The token this tab was launched with: from the address, else kept from an earlier load; read only. */
export function tokenOf(location: Pick<Location, 'hash'>, storage: Pick<Storage, 'getItem'> | null): string | null {
  const match = TOKEN_IN_FRAGMENT.exec(location.hash);
  if (match) return match[1];
  try {
    return storage?.getItem(TOKEN_KEY) ?? null;
  } catch {
    return null;
  }
}

/** One service call over HTTP: a POST of the JSON body to ./api/METHOD with the launch token (the window's own calls too, client.ts). */
export function postService(fetcher: typeof fetch, token: string, method: string, body: string): Promise<Response> {
  return fetcher(`./api/${method}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', [TOKEN_HEADER]: token },
    body,
    credentials: 'same-origin',
    cache: 'no-store',
  });
}

const key = (method: string, body: string): string => `${method} ${body}`;

/** Answers sent ahead, by method and body, until the window takes them. */
const sent = new Map<string, Promise<Response>>();
/** Calls the window made itself while nothing was sent ahead for them: never sent from here afterwards. */
const asked = new Set<string>();
let open = false;

/**
 * The answer sent ahead for this call (method and JSON body, as the window
 * sends it), once; undefined when none was sent or the first start is over.
 */
export function takeEarlyRequest(method: string, body: string): Promise<Response> | undefined {
  if (!open) return undefined;
  const k = key(method, body);
  const answer = sent.get(k);
  if (answer) sent.delete(k);
  else asked.add(k);
  return answer;
}

/** The window's first start is over: answers not taken are dropped, and nothing more is sent or taken. */
export function endEarlyRequests(): void {
  open = false;
  sent.clear();
  asked.clear();
}

export interface EarlyEnvironment {
  location: Pick<Location, 'protocol' | 'hash'>;
  sessionStorage: Pick<Storage, 'getItem'> | null;
  localStorage: Pick<Storage, 'getItem'> | null;
  fetch: typeof fetch;
  /** True in the desktop window (its preload set `window.api`). */
  desktop: boolean;
}

/** Sends the window's first calls (see the top of this file); answers whether any were sent. */
export function sendEarlyRequests(env: EarlyEnvironment): boolean {
  if (env.desktop || env.location.protocol !== 'http:' || typeof env.fetch !== 'function') return false;
  const token = tokenOf(env.location, env.sessionStorage);
  if (!token) return false;
  open = true;
  const post = (method: string, request: object): Promise<Response> | undefined => {
    const body = JSON.stringify(request);
    const k = key(method, body);
    if (!open || asked.has(k) || sent.has(k)) return undefined;
    const answer = postService(env.fetch, token, method, body);
    // The window may never take it (it had a draft, or its start went another way): never an unhandled rejection.
    answer.catch(() => {});
    sent.set(k, answer);
    return answer;
  };
  const read = async (answer: Promise<Response> | undefined): Promise<{ ok?: boolean; value?: unknown } | null> => {
    try {
      return answer ? ((await (await answer).clone().json()) as { ok?: boolean; value?: unknown }) : null;
    } catch {
      return null;
    }
  };
  const project = post('getProject', {});
  post('keptDrafts', {});
  const concepts = post('listConcepts', {});
  void Promise.all([read(project), read(concepts)]).then(([info, list]) => {
    const file = info?.ok && info.value && typeof (info.value as { file?: unknown }).file === 'string' ? (info.value as { file: string }).file : null;
    if (file === null || !list?.ok || !Array.isArray(list.value)) return;
    let remembered: string | null = null;
    try {
      remembered = env.localStorage?.getItem(rememberedConceptKey(file)) ?? null;
    } catch {
      remembered = null;
    }
    const first = conceptToOpen(list.value as { name: string; latestVersion: number | null }[], remembered);
    if (!first) return;
    // The window asks for the newest version together with the version list (ProjectState.selectConcept).
    if (first.latestVersion !== null) post('getVersion', { version: first.latestVersion });
    post('listVersions', { concept: first.name });
  });
  return true;
}

if (typeof window !== 'undefined' && typeof document !== 'undefined') {
  const storage = (name: 'sessionStorage' | 'localStorage'): Storage | null => {
    try {
      return window[name];
    } catch {
      return null;
    }
  };
  sendEarlyRequests({
    location: window.location,
    sessionStorage: storage('sessionStorage'),
    localStorage: storage('localStorage'),
    fetch: typeof window.fetch === 'function' ? window.fetch.bind(window) : (undefined as unknown as typeof fetch),
    desktop: (window as { api?: unknown }).api !== undefined,
  });
}
