import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
	clearDraft,
	loadDraft,
	loadSettings,
	markInstallExplained,
	openStore,
	requestPersistence,
	requestPersistenceOnce,
	sanitizeSettings,
	saveCheck,
	saveDraft,
	saveSettings,
	shouldExplainInstall,
	BUILT_IN_FACTOR_SETS,
	DEFAULT_SETTINGS,
	type FactorSet
} from '../../../src/lib/storage';
import { openFreshStore, plainCheck, stubWritesQuota } from '../../storage/support';

describe('the current draft', () => {
	it('keeps one draft, replaced on every save, and is gone after clearing', async () => {
		const store = await openFreshStore('draft');
		expect(await loadDraft(store)).toEqual({ ok: true, value: null });
		await saveDraft(store, { form: { span: '6,0' }, now: new Date('2026-05-01T00:00:00.000Z') });
		const later = new Date('2026-05-01T00:01:00.000Z');
		await saveDraft(store, { form: { span: '6,5' }, recordId: 'r1', now: later });
		const loaded = await loadDraft(store);
		expect(loaded).toEqual({
			ok: true,
			value: {
				slot: 'current',
				savedAt: '2026-05-01T00:01:00.000Z',
				recordId: 'r1',
				form: { span: '6,5' }
			}
		});
		expect(await clearDraft(store)).toEqual({ ok: true, value: null });
		expect(await loadDraft(store)).toEqual({ ok: true, value: null });
		store.close();
	});

	it('survives closing and reopening the database (a reload or an update)', async () => {
		const first = await openFreshStore('draft-reload');
		await saveDraft(first, { form: { loads: [1, 2] } });
		first.close();
		const reopened = await openStore(first.name);
		if (!reopened.ok) throw new Error(reopened.message);
		const loaded = await loadDraft(reopened.store);
		expect(loaded.ok && loaded.value?.form).toEqual({ loads: [1, 2] });
		reopened.store.close();
	});

	it('keeps the previous draft when the disk is full', async () => {
		const store = await openFreshStore('draft-quota');
		await saveDraft(store, { form: 'before' });
		const restore = stubWritesQuota(0);
		const failed = await saveDraft(store, { form: 'after' }).finally(restore);
		expect(failed.ok === false && failed.reason).toBe('quota');
		const loaded = await loadDraft(store);
		expect(loaded.ok && loaded.value?.form).toBe('before');
		store.close();
	});
});

describe('settings', () => {
	it('loads the defaults before anything is saved, then what was saved', async () => {
		const store = await openFreshStore('settings');
		expect(await loadSettings(store)).toEqual({ ok: true, value: DEFAULT_SETTINGS });
		const own: FactorSet = { ...BUILT_IN_FACTOR_SETS[1], id: 'own-uk', name: 'UK NA', xi: 0.925 };
		const changed = {
			...DEFAULT_SETTINGS,
			units: 'US' as const,
			factorSets: [own],
			activeFactorSetId: 'own-uk',
			theme: 'contrast' as const
		};
		expect((await saveSettings(store, changed)).ok).toBe(true);
		expect(await loadSettings(store)).toEqual({ ok: true, value: changed });
		store.close();
	});

	it('defaults to EN 1990 eq. 6.10 with the recommended factors and span/200', () => {
		const active = BUILT_IN_FACTOR_SETS.find((f) => f.id === DEFAULT_SETTINGS.activeFactorSetId);
		// EN 1990 Table A1.2(B) recommended: γG,sup = 1.35, γG,inf = 1.00, γQ = 1.50, ξ = 0.85.
		expect(active).toMatchObject({
			combination: '6.10',
			gammaG: 1.35,
			gammaGinf: 1.0,
			gammaQ: 1.5,
			xi: 0.85
		});
		// EN 1993-1-1 6.1 Note 2B recommended γM0 = γM1 = 1.00 (from memory).
		expect(active).toMatchObject({ gammaM0: 1.0, gammaM1: 1.0 });
		// EN 1990 Table A1.1, ψ0 = 0.7 for imposed loads, categories A–D (from memory).
		expect(active?.psi0).toBe(0.7);
		// span/200: common practice for beams under variable load.
		expect(DEFAULT_SETTINGS.deflectionLimit).toBe(200);
		expect(BUILT_IN_FACTOR_SETS.map((f) => f.combination)).toEqual(['6.10', '6.10a/b']);
	});

	it('repairs a damaged settings entry field by field', () => {
		const repaired = sanitizeSettings({
			units: 'imperial',
			deflectionLimit: -5,
			theme: 'dark',
			activeFactorSetId: 'gone',
			factorSets: [{ id: 'bad', gammaG: 'x' }],
			userName: 'A. Engineer'
		});
		expect(repaired).toEqual({ ...DEFAULT_SETTINGS, theme: 'dark', userName: 'A. Engineer' });
	});

	it('turns anything at all into valid settings (property)', () => {
		fc.assert(
			fc.property(fc.anything(), (raw) => {
				const s = sanitizeSettings(raw);
				expect(['SI', 'US']).toContain(s.units);
				expect(s.deflectionLimit).toBeGreaterThan(0);
				const ids = [...BUILT_IN_FACTOR_SETS, ...s.factorSets].map((f) => f.id);
				expect(ids).toContain(s.activeFactorSetId);
				expect(sanitizeSettings(s)).toEqual(s);
			})
		);
	});
});

describe('persistent storage and the install explanation', () => {
	it('wraps navigator.storage.persist without throwing', async () => {
		expect(await requestPersistence({ persist: async () => true })).toBe('granted');
		expect(await requestPersistence({ persist: async () => false })).toBe('denied');
		const refusing = { persist: () => Promise.reject(new Error('no')) };
		expect(await requestPersistence(refusing)).toBe('denied');
		expect(await requestPersistence({})).toBe('unsupported');
	});

	it('asks once, on the first save', async () => {
		const store = await openFreshStore('persist');
		expect(await requestPersistenceOnce(store, { persist: async () => true })).toBe('granted');
		expect(await requestPersistenceOnce(store, { persist: async () => true })).toBeNull();
		const saved = await saveCheck(store, plainCheck('t'));
		expect(saved.ok && saved.value.persistence).toBeNull();
		store.close();
	});

	it('reports the answer on the very first save', async () => {
		const store = await openFreshStore('persist-first');
		const saved = await saveCheck(store, plainCheck('t'));
		// Node has no navigator.storage.persist, so the wrapped answer is 'unsupported'.
		expect(saved.ok && saved.value.persistence).toBe('unsupported');
		store.close();
	});

	it('explains installing once', async () => {
		const store = await openFreshStore('install');
		expect(await shouldExplainInstall(store)).toEqual({ ok: true, value: true });
		await markInstallExplained(store);
		expect(await shouldExplainInstall(store)).toEqual({ ok: true, value: false });
		store.close();
	});
});
