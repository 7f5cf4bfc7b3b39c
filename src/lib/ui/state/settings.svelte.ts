import {
	findActiveFactorSet,
	listFactorSets,
	loadSettings,
	sanitizeSettings,
	saveSettings,
	withFactorSet,
	withoutFactorSet,
	DEFAULT_SETTINGS,
	type CheckStore,
	type FactorSet,
	type Settings,
	type StoreResult
} from '$lib/storage';

export { BUILT_IN_FACTOR_SETS, DEFAULT_SETTINGS } from '$lib/storage';
export type { FactorSet, LateralRestraint, Settings, Theme } from '$lib/storage';

/**
 * The user's settings as reactive state, persisted through the storage API. Values are replaced
 * whole on every change (hence `$state.raw`); stored values stay SI whatever `units` says.
 */
export class SettingsState {
	current = $state.raw<Settings>(sanitizeSettings(DEFAULT_SETTINGS));
	loaded = $state(false);
	/** The last storage problem in plain words, or null. Settings still apply for this session. */
	problem = $state<string | null>(null);
	factorSets = $derived(listFactorSets(this.current));
	activeFactorSet = $derived(findActiveFactorSet(this.current));
	#store: CheckStore | null = null;

	/** Reads the saved settings; with no store (storage refused) the defaults stay in use. */
	async load(store: CheckStore | null): Promise<void> {
		this.#store = store;
		if (store) {
			const loaded = await loadSettings(store);
			if (loaded.ok) this.current = loaded.value;
			this.problem = loaded.ok ? null : loaded.message;
		}
		this.loaded = true;
	}

	/** Changes some settings and saves them; a failed save keeps the change for this session. */
	async update(patch: Partial<Settings>): Promise<StoreResult<Settings>> {
		return this.#apply(sanitizeSettings({ ...this.current, ...patch }));
	}

	/** Adds or replaces an own factor set; refused with a message when a value is out of range. */
	async putFactorSet(set: FactorSet): Promise<StoreResult<Settings>> {
		const next = withFactorSet(this.current, set);
		if (!next.ok) return { ok: false, reason: 'storage', message: next.message };
		return this.#apply(next.value);
	}

	/** Removes an own factor set (built-in sets cannot be removed). */
	async removeFactorSet(id: string): Promise<StoreResult<Settings>> {
		return this.#apply(withoutFactorSet(this.current, id));
	}

	/** Back to the defaults, keeping the user's name and company. */
	async reset(): Promise<StoreResult<Settings>> {
		const { userName, company } = this.current;
		return this.#apply({ ...sanitizeSettings(DEFAULT_SETTINGS), userName, company });
	}

	async #apply(next: Settings): Promise<StoreResult<Settings>> {
		this.current = next;
		if (!this.#store) {
			this.problem = 'Settings apply now but cannot be kept: this browser refused storage.';
			return { ok: true, value: next };
		}
		const saved = await saveSettings(this.#store, next);
		this.problem = saved.ok ? null : saved.message;
		return saved;
	}
}

/** The app's one settings state. */
export const settings = new SettingsState();
