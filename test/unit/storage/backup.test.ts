import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
	exportBackup,
	importBackup,
	listChecks,
	purgeDeleted,
	saveCheck,
	updateCheck,
	BACKUP_FORMAT,
	BACKUP_VERSION,
	MAX_BACKUP_CHARS,
	type CheckRecord,
	type CheckStore
} from '../../../src/lib/storage';
import fixture from '../../fixtures/db/checks-v1.json';
import { demoCase, openFreshStore, stubEngine, stubWritesQuota } from '../../storage/support';

const versions = { appVersion: '0.1.0', engineVersion: '0.1.0' };
const counts = (added: number, beside: number, skipped: number, attention = 0, photos = 0) => ({
	ok: true,
	added,
	beside,
	skipped,
	attention,
	photos
});

async function fill(store: CheckStore, titles: string[]): Promise<CheckRecord[]> {
	const records: CheckRecord[] = [];
	for (const [i, title] of titles.entries()) {
		const saved = await saveCheck(store, {
			title,
			input: demoCase('UB', 5 + i),
			result: { demo: i },
			engineVersion: '0.1.0',
			now: new Date(Date.UTC(2026, 4, 1 + i))
		});
		if (!saved.ok) throw new Error(saved.message);
		records.push(saved.value.record);
	}
	return records;
}

async function exportText(store: CheckStore): Promise<string> {
	const text = await exportBackup(store, versions);
	if (!text.ok) throw new Error(text.message);
	return text.value;
}

// Everything stored, deleted checks included, by id: what an import must never take away.
async function everything(store: CheckStore): Promise<CheckRecord[]> {
	const all = (await store.db?.getAll('checks')) ?? [];
	return all.sort((a, b) => (a.id < b.id ? -1 : 1));
}

async function live(store: CheckStore): Promise<CheckRecord[]> {
	const list = await listChecks(store);
	if (!list.ok) throw new Error(list.message);
	return list.value;
}

const fileOf = (records: unknown[]) =>
	JSON.stringify({ format: BACKUP_FORMAT, version: 1, records });

describe('exportBackup', () => {
	it('writes our format with version, date, app and engine versions, and every live check', async () => {
		const store = await openFreshStore('export');
		const records = await fill(store, ['One', 'Two']);
		const now = new Date('2026-07-01T00:00:00.000Z');
		const text = await exportBackup(store, { ...versions, now });
		expect(text.ok).toBe(true);
		const file = JSON.parse(text.ok ? text.value : '{}');
		expect(file.format).toBe(BACKUP_FORMAT);
		expect(file.version).toBe(BACKUP_VERSION);
		expect(file.photos).toEqual([]);
		expect(file.exportedAt).toBe('2026-07-01T00:00:00.000Z');
		expect(file.appVersion).toBe('0.1.0');
		expect(file.records).toEqual(records);
		store.close();
	});
});

describe('importBackup only adds', () => {
	it('adds everything into an empty store, then skips identical records on a second import', async () => {
		const source = await openFreshStore('import-src');
		const records = await fill(source, ['A', 'B', 'C']);
		const text = await exportText(source);
		const target = await openFreshStore('import-dst');
		const engine = stubEngine();
		expect(await importBackup(target, text, engine)).toEqual(counts(3, 0, 0));
		expect(await importBackup(target, text, engine)).toEqual(counts(0, 0, 3));
		const ids = (list: CheckRecord[]) => list.map((r) => r.id).sort();
		expect(ids(await live(target))).toEqual(ids(records));
		source.close();
		target.close();
	});

	it('keeps a far-future record with a known id beside the local one, which keeps its revisions', async () => {
		const store = await openFreshStore('future-date');
		const [a] = await fill(store, ['Trimmer']);
		const edited = await updateCheck(store, a.id, { input: demoCase('UB', 7), result: null });
		const again = await updateCheck(store, a.id, { input: demoCase('UB', 8), result: null });
		if (!edited.ok || !again.ok) throw new Error('edit failed');
		expect(again.value.revisions).toHaveLength(2);
		const before = await everything(store);
		const hostile = {
			...again.value,
			title: 'Trimmer',
			input: demoCase('UB', 12),
			updatedAt: '2999-01-01T00:00:00.000Z',
			revisions: []
		};
		expect(await importBackup(store, fileOf([hostile]), stubEngine())).toEqual(counts(0, 1, 0));

		const after = await everything(store);
		expect(after.find((r) => r.id === a.id)).toEqual(before[0]);
		expect(after.find((r) => r.id === a.id)?.revisions).toHaveLength(2);
		const copy = after.find((r) => r.id !== a.id);
		expect(copy?.title).toBe('Trimmer (imported)');
		expect(copy?.input).toEqual(demoCase('UB', 12));
		expect(copy?.updatedAt).toBe('2999-01-01T00:00:00.000Z');
		store.close();
	});

	it('recognises a copy kept beside when the same file is imported again', async () => {
		const store = await openFreshStore('beside-twice');
		const [a] = await fill(store, ['Beam']);
		const file = fileOf([
			{ ...a, input: demoCase('UB', 9), updatedAt: '2027-01-01T00:00:00.000Z' }
		]);
		expect(await importBackup(store, file, stubEngine())).toEqual(counts(0, 1, 0));
		expect(await importBackup(store, file, stubEngine())).toEqual(counts(0, 0, 1));
		expect((await live(store)).map((r) => r.title).sort()).toEqual(['Beam', 'Beam (imported)']);
		store.close();
	});

	it('never hides or purges a local check because of a deletion mark in the file', async () => {
		const store = await openFreshStore('deleted-mark');
		const [a, b] = await fill(store, ['Kept A', 'Kept B']);
		const before = await everything(store);
		const old = '2000-01-01T00:00:00.000Z';
		// Same content with a mark (skipped), other content with a mark (beside), a new id with one.
		const file = fileOf([
			{ ...a, deletedAt: old },
			{ ...b, notes: 'changed elsewhere', deletedAt: old, updatedAt: '2999-01-01T00:00:00.000Z' },
			{ ...b, id: 'new-one', title: 'New', input: demoCase('UB', 3), deletedAt: old }
		]);
		expect(await importBackup(store, file, stubEngine())).toEqual(counts(1, 1, 1));
		expect(await purgeDeleted(store, { before: new Date('2100-01-01T00:00:00.000Z') })).toEqual({
			ok: true,
			value: 0
		});
		const after = await everything(store);
		for (const record of before) expect(after).toContainEqual(record);
		expect(after).toHaveLength(4);
		// The file's own marks are dropped: everything it brought is live.
		expect(after.every((r) => r.deletedAt === null)).toBe(true);
		expect((await live(store)).map((r) => r.title).sort()).toEqual([
			'Kept A',
			'Kept B',
			'Kept B (imported)',
			'New'
		]);
		store.close();
	});

	it('never takes a check back from the local bin or changes it; a same-id record goes beside', async () => {
		const store = await openFreshStore('local-deleted');
		const [a] = await fill(store, ['Binned']);
		const deletedHere = { ...a, deletedAt: '2026-06-01T00:00:00.000Z' };
		await store.db?.put('checks', deletedHere);
		expect(await importBackup(store, fileOf([a]), stubEngine())).toEqual(counts(0, 1, 0));
		const after = await everything(store);
		expect(after.find((r) => r.id === a.id)).toEqual(deletedHere);
		expect((await live(store)).map((r) => r.title)).toEqual(['Binned (imported)']);
		store.close();
	});

	it('stores only the verdict it computed: the file’s verdicts and results are never trusted', async () => {
		const store = await openFreshStore('verdicts');
		const [a] = await fill(store, ['Local']);
		const claims = { verdict: 'pass', answer: { verdict: 'pass' } };
		const file = fileOf([
			{
				...a,
				id: 'long',
				input: demoCase('UB', 14),
				result: claims,
				computed: { verdict: 'pass', computedBy: 'stub-1' }
			},
			{ ...a, id: 'bad', input: demoCase('UB', -1), result: claims },
			{ ...a, id: 'fine', input: demoCase('UB', 4), result: claims }
		]);
		const engine = stubEngine('stub-1');
		expect(await importBackup(store, file, engine)).toEqual(counts(3, 0, 0, 1));
		expect(engine.calls).toHaveLength(3);
		const byId = new Map((await everything(store)).map((r) => [r.id, r]));
		expect(byId.get('long')?.computed).toEqual({ verdict: 'fail', computedBy: 'stub-1' });
		expect(byId.get('bad')?.computed).toEqual({ verdict: 'needs-attention', computedBy: 'stub-1' });
		expect(byId.get('fine')?.computed).toEqual({ verdict: 'pass', computedBy: 'stub-1' });
		store.close();
	});

	it('counts a recompute that throws as needing attention, not as a failed import', async () => {
		const store = await openFreshStore('recompute-throws');
		const file = fileOf([{ ...fixture.records[1], id: 'x' }]);
		const recompute = () => {
			throw new Error('engine invariant');
		};
		expect(await importBackup(store, file, { recompute, engineVersion: 'e' })).toEqual(
			counts(1, 0, 0, 1)
		);
		store.close();
	});

	it('keeps only the fields of a check, dropping anything else the file adds', async () => {
		const store = await openFreshStore('extra-fields');
		const [a] = await fill(store, ['A']);
		const extra = { ...a, id: 'extra', notes: 'other', surprise: { big: true } };
		const file = fileOf([{ ...extra, place: { ...a.place, x: 1 } }]);
		expect(await importBackup(store, file, stubEngine())).toEqual(counts(1, 0, 0));
		const stored = await store.db?.get('checks', 'extra');
		expect(stored && 'surprise' in stored).toBe(false);
		expect(stored?.place).toEqual(a.place);
		store.close();
	});

	it('upgrades version-1 records found in a backup', async () => {
		const store = await openFreshStore('import-v1');
		expect(await importBackup(store, fileOf(fixture.records), stubEngine())).toEqual(
			counts(3, 0, 0, 1)
		);
		const list = await live(store);
		// The v1 record deleted in its own database arrives live: a file cannot hide a check.
		expect(list.map((r) => r.place.building).sort()).toEqual([
			'',
			'Demo Block A, level 2, grid C/4',
			'Demo Block B'
		]);
		store.close();
	});
});

describe('importBackup refuses a bad file and changes nothing', () => {
	it('refuses damaged, truncated, foreign, newer, hostile and oversized files with a message', async () => {
		const store = await openFreshStore('refuse');
		await fill(store, ['Kept']);
		const good = await exportText(store);
		const before = await everything(store);
		const parsed = JSON.parse(good);
		const withRecord = (record: unknown) => JSON.stringify({ ...parsed, records: [record] });
		const recordText = JSON.stringify(parsed.records[0]);
		let deep: unknown = 1;
		for (let i = 0; i < 200; i++) deep = [deep];
		const cases: [string, string, RegExp][] = [
			['not json at all', 'damaged', /not readable JSON/],
			[good.slice(0, Math.floor(good.length / 2)), 'damaged', /cut short/],
			['', 'damaged', /not readable JSON/],
			[withRecord({ ...parsed.records[0], updatedAt: 'yesterday' }), 'damaged', /updatedAt/],
			[
				JSON.stringify({ ...parsed, records: [parsed.records[0], parsed.records[0]] }),
				'damaged',
				/twice/
			],
			[JSON.stringify({ ...parsed, records: 'none' }), 'damaged', /no list/],
			[JSON.stringify({ ...parsed, records: new Array(5001).fill(null) }), 'damaged', /more than/],
			[
				JSON.stringify({ format: 'some-other-app', version: 1, records: [] }),
				'foreign',
				/not a Hingepoint backup/
			],
			[JSON.stringify(demoCase()), 'foreign', /single Hingepoint case/],
			[JSON.stringify([1, 2, 3]), 'foreign', /not a Hingepoint backup/],
			[JSON.stringify({ ...parsed, version: BACKUP_VERSION + 1 }), 'newer', /newer version/],
			[withRecord({ ...parsed.records[0], id: 'n', schemaVersion: 9 }), 'newer', /newer version/],
			[
				fileOf([JSON.parse(recordText.replace('{', '{"__proto__":{"polluted":true},'))]),
				'damaged',
				/__proto__/
			],
			[
				`{"format":"${BACKUP_FORMAT}","version":1,"__proto__":{"records":[]},"records":[]}`,
				'damaged',
				/__proto__/
			],
			[
				withRecord({ ...parsed.records[0], input: { ...parsed.records[0].input, constructor: 1 } }),
				'damaged',
				/constructor/
			],
			[withRecord({ ...parsed.records[0], notes: deep }), 'damaged', /nesting/],
			[' '.repeat(MAX_BACKUP_CHARS + 1), 'damaged', /larger than any backup/]
		];
		for (const [text, reason, message] of cases) {
			const engine = stubEngine();
			const result = await importBackup(store, text, engine);
			expect(result, text.slice(0, 60)).toMatchObject({ ok: false, reason });
			if (!result.ok) expect(result.message, text.slice(0, 60)).toMatch(message);
			expect(engine.calls, 'nothing is computed for a refused file').toHaveLength(0);
		}
		expect(({} as Record<string, unknown>).polluted).toBeUndefined();
		expect(await everything(store)).toEqual(before);
		store.close();
	});

	it('is one transaction: a full disk half-way through leaves the store as it was', async () => {
		const source = await openFreshStore('atomic-src');
		await fill(source, ['A', 'B', 'C', 'D']);
		const text = await exportText(source);
		const target = await openFreshStore('atomic-dst');
		await fill(target, ['Already here']);
		const before = await everything(target);
		const restore = stubWritesQuota(2);
		let result;
		try {
			result = await importBackup(target, text, stubEngine());
		} finally {
			restore();
		}
		expect(result).toMatchObject({ ok: false, reason: 'storage' });
		expect(result?.ok === false && result.message).toMatch(/storage is full/);
		expect(await everything(target)).toEqual(before);
		source.close();
		target.close();
	});

	it('round-trips any set of checks through a backup into an empty store (property)', async () => {
		const place = fc.record({ building: fc.string(), level: fc.string(), grid: fc.string() });
		const span = fc.double({ min: 0.1, max: 50, noNaN: true });
		const check = fc.record({ title: fc.string(), notes: fc.string(), place, span });
		await fc.assert(
			fc.asyncProperty(fc.array(check, { maxLength: 5 }), async (checks) => {
				const source = await openFreshStore('prop-src');
				for (const c of checks) {
					await saveCheck(source, {
						...c,
						input: demoCase('UB', c.span),
						result: null,
						engineVersion: '1'
					});
				}
				const target = await openFreshStore('prop-dst');
				const engine = stubEngine();
				const result = await importBackup(target, await exportText(source), engine);
				// Checks with the same content (fast-check repeats values) are added once.
				expect(result).toMatchObject({ ok: true, beside: 0, attention: 0 });
				const added = result.ok ? result.added + result.skipped : -1;
				expect(added).toBe(checks.length);
				// Everything but the verdict, which the target computed itself.
				const plain = (list: CheckRecord[]) =>
					list.map((r) => ({ ...r, computed: null })).sort((x, y) => (x.id < y.id ? -1 : 1));
				const kept = plain(await live(target));
				const sourceIds = new Set((await live(source)).map((r) => r.id));
				expect(kept.every((r) => sourceIds.has(r.id))).toBe(true);
				const keptIds = new Set(kept.map((k) => k.id));
				expect(kept).toEqual(plain(await live(source)).filter((r) => keptIds.has(r.id)));
				expect((await live(target)).every((r) => r.computed?.computedBy === 'stub-1')).toBe(true);
				source.close();
				target.close();
			}),
			{ numRuns: 25 }
		);
	});
});
