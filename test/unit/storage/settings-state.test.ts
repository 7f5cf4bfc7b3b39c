import { describe, expect, it } from 'vitest';
import {
	SettingsState,
	DEFAULT_SETTINGS,
	BUILT_IN_FACTOR_SETS
} from '../../../src/lib/ui/state/settings.svelte';
import { loadSettings, openStore } from '../../../src/lib/storage';
import { openFreshStore, stubWritesQuota } from '../../storage/support';

describe('SettingsState', () => {
	it('starts from the defaults and keeps changes through a reopen of the store', async () => {
		const store = await openFreshStore('settings-state');
		const state = new SettingsState();
		await state.load(store);
		expect(state.current).toEqual(DEFAULT_SETTINGS);
		expect(state.activeFactorSet).toEqual(BUILT_IN_FACTOR_SETS[0]);
		await state.update({ units: 'US', userName: 'A. Engineer', deflectionLimit: 250 });
		store.close();

		const reopened = await openStore(store.name);
		if (!reopened.ok) throw new Error(reopened.message);
		const again = new SettingsState();
		await again.load(reopened.store);
		expect(again.current).toMatchObject({
			units: 'US',
			userName: 'A. Engineer',
			deflectionLimit: 250
		});
		reopened.store.close();
	});

	it('adds, selects and removes an own factor set; refuses an out-of-range one', async () => {
		const store = await openFreshStore('settings-sets');
		const state = new SettingsState();
		await state.load(store);
		// ξ = 0.925: UK National Annex to EN 1990 (from memory).
		const own = { ...BUILT_IN_FACTOR_SETS[1], id: 'own-uk', name: 'UK NA (6.10a/b)', xi: 0.925 };
		expect((await state.putFactorSet(own)).ok).toBe(true);
		await state.update({ activeFactorSetId: 'own-uk' });
		expect(state.activeFactorSet.xi).toBe(0.925);
		expect(state.factorSets.map((f) => f.id)).toEqual(['en1990-6.10', 'en1990-6.10ab', 'own-uk']);
		const bad = await state.putFactorSet({ ...own, id: 'bad', psi0: 1.5 });
		expect(bad.ok).toBe(false);
		await state.removeFactorSet('own-uk');
		expect(state.current.activeFactorSetId).toBe(DEFAULT_SETTINGS.activeFactorSetId);
		const stored = await loadSettings(store);
		expect(stored.ok && stored.value.factorSets).toEqual([]);
		store.close();
	});

	it('keeps a change for the session and says why when it cannot be saved', async () => {
		const store = await openFreshStore('settings-quota');
		const state = new SettingsState();
		await state.load(store);
		const restore = stubWritesQuota(0);
		const saved = await state.update({ theme: 'contrast' }).finally(restore);
		expect(saved.ok).toBe(false);
		expect(state.current.theme).toBe('contrast');
		expect(state.problem).toMatch(/storage is full/);
		store.close();
	});

	it('works without storage, on defaults', async () => {
		const state = new SettingsState();
		await state.load(null);
		expect(state.loaded).toBe(true);
		const saved = await state.update({ theme: 'dark' });
		expect(saved.ok).toBe(true);
		expect(state.current.theme).toBe('dark');
		expect(state.problem).toMatch(/cannot be kept/);
	});
});
