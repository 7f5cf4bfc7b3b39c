import { describe, expect, it } from 'vitest';
import {
	getCheck,
	saveCheck,
	BACKUP_FORMAT,
	MAX_BACKUP_CHARS,
	type CheckStore
} from '../../../src/lib/storage';
import {
	SavedChecks,
	NO_STORAGE_MESSAGE,
	type VerdictEngine
} from '../../../src/lib/ui/state/saved-checks.svelte';
import { demoCase, openFreshStore, plainCheck, stubEngine } from '../../storage/support';

function engineOf(stub: ReturnType<typeof stubEngine>): VerdictEngine {
	return { loadVersion: async () => stub.engineVersion, loadRecompute: async () => stub.recompute };
}

function stateFor(store: CheckStore | null, stub = stubEngine()): SavedChecks {
	return new SavedChecks({ connect: async () => store, engine: engineOf(stub) });
}

describe('SavedChecks verdicts', () => {
	it('lists only verdicts it computed, stores them, and recomputes for a new engine only', async () => {
		const store = await openFreshStore('state-verdicts');
		// The stored result claims a pass; the stand-in engine fails any span over 10 m.
		const saved = await saveCheck(store, {
			...plainCheck('Long'),
			input: demoCase('UB', 14),
			result: { verdict: 'pass' }
		});
		if (!saved.ok) throw new Error(saved.message);
		const { record } = saved.value;
		const first = stubEngine('e1');
		const state = stateFor(store, first);
		expect(state.verdictOf(record)).toBe('pending');
		await state.refresh();
		expect(state.verdictOf(state.records[0])).toBe('fail');
		expect(first.calls).toHaveLength(1);
		const stored = await getCheck(store, record.id);
		expect(stored.ok && stored.value.computed).toEqual({ verdict: 'fail', computedBy: 'e1' });
		expect(stored.ok && stored.value.updatedAt).toBe(record.updatedAt);

		await stateFor(store, first).refresh();
		expect(first.calls).toHaveLength(1);
		const second = stubEngine('e2');
		const newer = stateFor(store, second);
		await newer.refresh();
		expect(second.calls).toHaveLength(1);
		expect(newer.verdictOf(newer.records[0])).toBe('fail');
		store.close();
	});

	it('imports a file claiming a pass and lists the failure it computes, saying what was added', async () => {
		const store = await openFreshStore('state-import');
		const saved = await saveCheck(store, plainCheck('Here'));
		if (!saved.ok) throw new Error(saved.message);
		const here = saved.value.record;
		const claim = { verdict: 'pass', computedBy: 'e1' };
		const file = JSON.stringify({
			format: BACKUP_FORMAT,
			version: 1,
			records: [
				{ ...here, input: demoCase('UB', 14), result: { verdict: 'pass' }, computed: claim },
				{ ...here, id: 'other', title: 'Other', input: demoCase('UB', -2) },
				// Same content under another id: already here.
				{ ...here, id: 'same-again' }
			]
		});
		const state = stateFor(store, stubEngine('e1'));
		await state.importFrom(file);
		expect(state.importMessage).toBe(
			'Added 2 checks, 1 kept beside an existing one with the same id, 1 already here. 1 check needs attention: the inputs did not pass validation, so no verdict is shown.'
		);
		const byTitle = new Map(state.records.map((r) => [r.title, state.verdictOf(r)]));
		expect(byTitle).toEqual(
			new Map([
				['Here', 'pass'],
				['Here (imported)', 'fail'],
				['Other', 'needs-attention']
			])
		);
		store.close();
	});

	it('says why a bad file was refused and changes nothing', async () => {
		const store = await openFreshStore('state-refuse');
		const state = stateFor(store);
		await state.importFrom(
			'{"format":"hingepoint.backup","version":1,"records":[],"__proto__":{}}'
		);
		expect(state.importMessage).toMatch(/^Backup refused, nothing changed: .*__proto__/);
		expect(state.records).toEqual([]);
		let read = false;
		const huge = { size: MAX_BACKUP_CHARS + 1, text: async () => ((read = true), '') };
		await state.importFile(huge);
		expect(state.importMessage).toMatch(/larger than any backup/);
		expect(read).toBe(false);
		store.close();
	});
});

describe('SavedChecks without storage', () => {
	it('says plainly that checks cannot be saved, and imports nothing', async () => {
		const state = stateFor(null);
		await state.refresh();
		expect(state.available).toBe(false);
		expect(state.loaded).toBe(true);
		expect(state.message).toBe(NO_STORAGE_MESSAGE);
		expect(NO_STORAGE_MESSAGE).toMatch(/cannot be saved on this device/);
		await state.importFrom('{}');
		expect(state.importMessage).toMatch(/^Nothing imported\./);
		expect(await state.exportAll()).toBeNull();
	});
});
