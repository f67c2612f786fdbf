/**
 * The side panels the window does not show when it opens (every tab but
 * Requirements and Design point), each built as its own chunk: the first
 * page carries only what the first diagram and the two panels beside it
 * need. A panel loads when its tab is chosen, and all of them once the
 * first diagram is drawn; the window reads as ready (`data-ready`) when
 * they are here, so a tab then shows at once when it is clicked.
 */
const LOADERS = {
  assumptions: () => import('./AssumptionsPanel.svelte'),
  mission: () => import('./MissionPanel.svelte'),
  ranges: () => import('./RangesPanel.svelte'),
  drivers: () => import('../mission/MassDriversPanel.svelte'),
  tornado: () => import('./TornadoPanel.svelte'),
  costs: () => import('./CostsPanel.svelte'),
  history: () => import('./HistoryPanel.svelte'),
} as const;

export type LaterPanel = keyof typeof LOADERS;
type Loaded = { [Name in LaterPanel]?: Awaited<ReturnType<(typeof LOADERS)[Name]>>['default'] };

/** The components of those panels loaded so far (the markup draws one once it is here). */
export class LaterPanels {
  // Components are replaced whole, never changed inside: no deep state.
  loaded = $state.raw<Loaded>({});
  #loading = new Map<LaterPanel, Promise<void>>();

  /** Loads a panel's chunk (once); resolves when its component is here. A chunk that fails to load is tried again next time. */
  load(name: LaterPanel): Promise<void> {
    const known = this.#loading.get(name);
    if (known) return known;
    const loading = LOADERS[name]().then(
      (module) => {
        this.loaded = { ...this.loaded, [name]: module.default };
      },
      () => {
        this.#loading.delete(name);
      },
    );
    this.#loading.set(name, loading);
    return loading;
  }

  /** Loads every panel not loaded yet (once the first diagram is drawn); resolves even when one could not be loaded. */
  loadAll(): Promise<void> {
    return Promise.all((Object.keys(LOADERS) as LaterPanel[]).map((name) => this.load(name))).then(() => undefined);
  }
}
