/**
 * How the person likes to read the window: SI or US customary units, and
 * power-to-weight or its inverse (power loading) for propeller aircraft.
 * Kept in the page's local storage, so a reload keeps them.
 */
// @ts-nocheck

import type { UnitSystem } from '../../../../core';

const KEY = 'loftpoint.preferences';

interface Stored {
  units: UnitSystem;
  powerLoading: boolean;
}

function load(storage: Storage | undefined): Stored {
  try {
    const value = JSON.parse(storage?.getItem(KEY) ?? '{}') as Partial<Stored>;
    return { units: value.units === 'us' || value.units === 'kt-ft' ? value.units : 'si', powerLoading: value.powerLoading === true };
  } catch {
    return { units: 'si', powerLoading: false };
  }
}

export class Preferences {
  #units = $state<UnitSystem>('si');
  #powerLoading = $state(false);
  readonly #storage: Storage | undefined;

  constructor(storage: Storage | undefined = globalThis.localStorage) {
    this.#storage = storage;
    const stored = load(storage);
    this.#units = stored.units;
    this.#powerLoading = stored.powerLoading;
  }

  get units(): UnitSystem {
    return this.#units;
  }

  set units(value: UnitSystem) {
    this.#units = value;
    this.#save();
  }

  /** Vertical axis as W/P instead of P/W (propeller aircraft only). */
  get powerLoading(): boolean {
    return this.#powerLoading;
  }

  set powerLoading(value: boolean) {
    this.#powerLoading = value;
    this.#save();
  }

  #save(): void {
    try {
      this.#storage?.setItem(KEY, JSON.stringify({ units: this.#units, powerLoading: this.#powerLoading }));
    } catch {
      // Storage may be full or disabled; the choice still holds until the page closes.
    }
  }
}
