import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
	exportBackup,
	importBackup,
	listChecks,
	saveCheck,
	updateCheck,
	BACKUP_FORMAT,
	type CheckRecord,
	type CheckStore
} from '../../../src/lib/storage';
import fixture from '../../fixtures/db/checks-v1.json';
import { demoCase, openFreshStore, stubWritesQuota } from '../../storage/support';

const versions = { appVersion: '0.1.0', engineVersion: '0.1.0' };
const counts = (added: number, updated: number, skipped: number) => ({
	ok: true,
	added,
	updated,
	skipped
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

async function snapshot(store: CheckStore): Promise<CheckRecord[]> {
	const list = await listChecks(store);
	if (!list.ok) throw new Error(list.message);
	return list.value;
}

describe('exportBackup', () => {
	it('writes our format with version, date, app and engine versions, and every live check', async () => {
		const store = await openFreshStore('export');
		const records = await fill(store, ['One', 'Two']);
		const now = new Date('2026-07-01T00:00:00.000Z');
		const text = await exportBackup(store, { ...versions, now });
		expect(text.ok).toBe(true);
		const file = JSON.parse(text.ok ? text.value : '{}');
		expect(file.format).toBe(BACKUP_FORMAT);
		expect(file.version).toBe(1);
		expect(file.exportedAt).toBe('2026-07-01T00:00:00.000Z');
		expect(file.appVersion).toBe('0.1.0');
		expect(file.records).toEqual(records);
		store.close();
	});
});

describe('importBackup', () => {
	it('adds everything into an empty store, then skips identical records on a second import', async () => {
		const source = await openFreshStore('import-src');
		const records = await fill(source, ['A', 'B', 'C']);
		const text = await exportText(source);
		const target = await openFreshStore('import-dst');
		expect(await importBackup(target, text)).toEqual(counts(3, 0, 0));
		expect(await importBackup(target, text)).toEqual(counts(0, 0, 3));
		const ids = (list: CheckRecord[]) => list.map((r) => r.id).sort();
		expect(ids(await snapshot(target))).toEqual(ids(records));
		source.close();
		target.close();
	});

	it('merges by id: the newer updatedAt wins, an older copy is skipped', async () => {
		const store = await openFreshStore('merge');
		const [a, b] = await fill(store, ['A', 'B']);
		const before = await exportText(store);
		const later = new Date('2027-01-01T00:00:00.000Z');
		await updateCheck(store, a.id, { title: 'A edited here' }, { now: later });
		// Backup holds an older A (skipped) and B; B is then edited elsewhere and re-imported.
		expect(await importBackup(store, before)).toEqual(counts(0, 0, 2));
		const file = JSON.parse(before);
		file.records[1] = { ...b, title: 'B edited elsewhere', updatedAt: '2027-02-01T00:00:00.000Z' };
		expect(await importBackup(store, JSON.stringify(file))).toEqual(counts(0, 1, 1));
		const titles = (await snapshot(store)).map((r) => r.title).sort();
		expect(titles).toEqual(['A edited here', 'B edited elsewhere']);
		store.close();
	});

	it('upgrades version-1 records found in a backup', async () => {
		const store = await openFreshStore('import-v1');
		const text = JSON.stringify({ format: BACKUP_FORMAT, version: 1, records: fixture.records });
		expect(await importBackup(store, text)).toEqual(counts(3, 0, 0));
		const list = await snapshot(store);
		expect(list.map((r) => r.place.building)).toEqual(['', 'Demo Block A, level 2, grid C/4']);
		store.close();
	});

	it('refuses damaged, truncated, foreign and newer files with a message, changing nothing', async () => {
		const store = await openFreshStore('refuse');
		await fill(store, ['Kept']);
		const good = await exportText(store);
		const before = await snapshot(store);
		const parsed = JSON.parse(good);
		const withRecord = (record: unknown) => JSON.stringify({ ...parsed, records: [record] });
		const cases: [string, string][] = [
			['not json at all', 'damaged'],
			[good.slice(0, Math.floor(good.length / 2)), 'damaged'],
			['', 'damaged'],
			[withRecord({ ...parsed.records[0], updatedAt: 'yesterday' }), 'damaged'],
			[JSON.stringify({ ...parsed, records: [parsed.records[0], parsed.records[0]] }), 'damaged'],
			[JSON.stringify({ ...parsed, records: 'none' }), 'damaged'],
			[JSON.stringify({ format: 'some-other-app', version: 1, records: [] }), 'foreign'],
			[JSON.stringify(demoCase()), 'foreign'],
			[JSON.stringify([1, 2, 3]), 'foreign'],
			[JSON.stringify({ ...parsed, version: 2 }), 'newer'],
			[withRecord({ ...parsed.records[0], id: 'n', schemaVersion: 9 }), 'newer']
		];
		for (const [text, reason] of cases) {
			const result = await importBackup(store, text);
			expect(result.ok, text.slice(0, 40)).toBe(false);
			if (!result.ok) {
				expect(result.reason, text.slice(0, 40)).toBe(reason);
				expect(result.message).toMatch(/./);
			}
		}
		expect(await snapshot(store)).toEqual(before);
		store.close();
	});

	it('is one transaction: a full disk half-way through leaves the store as it was', async () => {
		const source = await openFreshStore('atomic-src');
		await fill(source, ['A', 'B', 'C', 'D']);
		const text = await exportText(source);
		const target = await openFreshStore('atomic-dst');
		await fill(target, ['Already here']);
		const before = await snapshot(target);
		const restore = stubWritesQuota(2);
		let result;
		try {
			result = await importBackup(target, text);
		} finally {
			restore();
		}
		expect(result).toMatchObject({ ok: false, reason: 'storage' });
		expect(result?.ok === false && result.message).toMatch(/storage is full/);
		expect(await snapshot(target)).toEqual(before);
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
				const result = await importBackup(target, await exportText(source));
				expect(result).toEqual(counts(checks.length, 0, 0));
				const byId = (list: CheckRecord[]) => [...list].sort((x, y) => (x.id < y.id ? -1 : 1));
				expect(byId(await snapshot(target))).toEqual(byId(await snapshot(source)));
				source.close();
				target.close();
			}),
			{ numRuns: 25 }
		);
	});
});
