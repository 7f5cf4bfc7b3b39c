// Database v2 → v3 on fake IndexedDB against the frozen fixture test/fixtures/db/checks-v2.json:
// every record gains an empty computed-verdict slot and keeps everything else, including the
// stored result whose verdict the list must no longer trust.
import { describe, expect, it } from 'vitest';
import fixture from '../fixtures/db/checks-v2.json';
import { upgradeRecord } from '../../src/lib/storage/record-upgrade';
import { findRecordProblem } from '../../src/lib/storage/validate-record';
import {
	getCheck,
	listChecks,
	loadDraft,
	loadSettings,
	storeVerdicts,
	DB_VERSION,
	RECORD_SCHEMA_VERSION
} from '../../src/lib/storage';
import { SavedChecks } from '../../src/lib/ui/state/saved-checks.svelte';
import { ENGINE_VERSION } from '../../src/lib/ui/state/engine-version';
import { openUpgradedFixture } from './support';

/** The frozen fixture, written at v2 and opened (so upgraded) by the current code. */
function openUpgraded(label: string) {
	return openUpgradedFixture(label, 2, fixture);
}

describe('v2 → v3 migration', () => {
	it('gives every record an empty verdict slot and keeps every other field exactly', async () => {
		const store = await openUpgraded('v2v3');
		expect(store.db?.version).toBe(DB_VERSION);
		for (const frozen of fixture.records) {
			const stored = await store.db?.get('checks', frozen.id);
			expect(stored).toEqual({ ...frozen, schemaVersion: 3, computed: null });
		}
		store.close();
	});

	it('keeps the stored result (nothing lost) but no longer treats it as a verdict', async () => {
		const store = await openUpgraded('v2v3-result');
		const first = await getCheck(store, fixture.records[0].id);
		if (!first.ok) throw new Error(first.message);
		expect(first.value.result).toEqual({ verdict: 'pass', demo: true });
		expect(first.value.computed).toBeNull();
		expect(first.value.revisions).toEqual(fixture.records[0].revisions);
		store.close();
	});

	it('lists the live checks newest first, keeps the deleted one hidden, the draft and settings', async () => {
		const store = await openUpgraded('v2v3-list');
		const list = await listChecks(store);
		expect(list.ok && list.value.map((r) => r.title)).toEqual([
			'Demo hoist on UB',
			'Demo overloaded trimmer'
		]);
		expect(await loadDraft(store)).toEqual({ ok: true, value: fixture.drafts[0] });
		const settings = await loadSettings(store);
		expect(settings.ok && settings.value).toMatchObject(fixture.meta[0].value as object);
		store.close();
	});

	it('accepts a computed verdict afterwards without touching the dates or revisions', async () => {
		const store = await openUpgraded('v2v3-verdict');
		const frozen = fixture.records[0];
		const computed = { verdict: 'fail' as const, computedBy: 'test' };
		const update = { id: frozen.id, updatedAt: frozen.updatedAt, computed };
		const written = await storeVerdicts(store, [update]);
		expect(written).toEqual({ ok: true, value: 1 });
		const after = await getCheck(store, frozen.id);
		expect(after.ok && after.value).toEqual({ ...frozen, schemaVersion: 3, computed });
		store.close();
	});

	it('then lists the verdict this app computes, not the pass the old stored result claimed', async () => {
		const store = await openUpgraded('v2v3-list-verdict');
		const saved = new SavedChecks({ connect: async () => store });
		await saved.refresh();
		const shown = new Map(saved.records.map((r) => [r.title, saved.verdictOf(r)]));
		// A known Mp with no restraint given: the flange is taken as held only at the supports, so
		// the elastic checks need section properties it lacks — outside scope, never the stored pass.
		expect(shown.get('Demo overloaded trimmer')).toBe('outside-scope');
		expect(shown.get('Demo hoist on UB')).toBe('pass');
		const stored = await getCheck(store, fixture.records[0].id);
		const expected = { verdict: 'outside-scope', computedBy: ENGINE_VERSION };
		expect(stored.ok && stored.value.computed).toEqual(expected);
		store.close();
	});

	it('upgrades each frozen v2 record by the pure upgrader to a valid current record', () => {
		for (const [i, v2] of fixture.records.entries()) {
			const upgraded = upgradeRecord(v2);
			expect(upgraded).toMatchObject({ ok: true, upgraded: true });
			if (!upgraded.ok) continue;
			expect(upgraded.record.schemaVersion).toBe(RECORD_SCHEMA_VERSION);
			expect(upgraded.record.computed).toBeNull();
			expect(findRecordProblem(upgraded.record, `records[${i}]`)).toBeNull();
		}
	});
});
