import 'fake-indexeddb/auto';
import { openDB } from 'idb';
import { applyStoreMigrations } from '../../src/lib/storage/migrations';
import {
	openStore,
	type CaseFile,
	type CheckStore,
	type ComputedVerdict,
	type NewCheck
} from '../../src/lib/storage';

let counter = 0;

/** A database name no other test uses, so every test starts empty. */
export function uniqueDbName(label: string): string {
	counter += 1;
	return `test-${label}-${counter}-${Math.random().toString(36).slice(2)}`;
}

/** Opens a fresh store or fails the test. */
export async function openFreshStore(label: string): Promise<CheckStore> {
	const opened = await openStore(uniqueDbName(label));
	if (!opened.ok) throw new Error(`could not open test store: ${opened.message}`);
	return opened.store;
}

/** A simply supported case file with no loads (demo data, invented). */
export function demoCase(designation = '305x165x40 UB', span = 6): CaseFile {
	return {
		format: 'hingepoint.case',
		version: 1,
		beam: { spans: [span], supports: ['pin', 'pin'], section: { designation } },
		loads: []
	};
}

/** A new check with no result, for tests that only need something to store. */
export function plainCheck(title: string): NewCheck {
	return { title, input: demoCase(), result: null, engineVersion: '0' };
}

/**
 * Makes every object-store `put` and `add` after the first `okWrites` throw QuotaExceededError,
 * as a full disk does. Returns the function that removes the stub.
 */
export function stubWritesQuota(okWrites = 0): () => void {
	const proto = globalThis.IDBObjectStore.prototype;
	const original = { put: proto.put, add: proto.add };
	let calls = 0;
	const failing = (method: 'put' | 'add') =>
		function (this: IDBObjectStore, value: unknown, key?: IDBValidKey) {
			calls += 1;
			if (calls > okWrites) {
				throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
			}
			return original[method].call(this, value, key);
		};
	proto.put = failing('put');
	proto.add = failing('add');
	return () => {
		proto.put = original.put;
		proto.add = original.add;
	};
}

/**
 * A stand-in for the engine in import tests (the real one is exercised where the verdict itself
 * matters): a first span over 10 m fails, a span that is not a positive number needs attention,
 * anything else passes. Counts its calls.
 */
export function stubEngine(engineVersion = 'stub-1') {
	const calls: unknown[] = [];
	const recompute = (input: unknown): ComputedVerdict => {
		calls.push(input);
		const span = (input as { beam?: { spans?: unknown[] } }).beam?.spans?.[0];
		if (typeof span !== 'number' || !(span > 0)) return 'needs-attention';
		return span > 10 ? 'fail' : 'pass';
	};
	return { engineVersion, recompute, calls };
}

/**
 * A stand-in photo: the bytes a JPEG file starts with, then `size` bytes that differ by `seed`.
 * Storage checks only the type's opening bytes; no test here decodes the picture.
 */
export function jpegBlob(seed = 1, size = 64): Blob {
	const bytes = new Uint8Array(size + 4);
	bytes.set([0xff, 0xd8, 0xff, 0xe0]);
	for (let i = 0; i < size; i++) bytes[4 + i] = (seed * 31 + i * 7) & 0xff;
	return new Blob([bytes], { type: 'image/jpeg' });
}

/** A frozen database fixture: what an older version stored, store by store. */
export interface FrozenDb {
	records: unknown[];
	drafts: unknown[];
	meta: unknown[];
}

/**
 * Writes a frozen fixture into a new database built by the migrations up to `version`, then
 * opens it with the current code, which upgrades it. `inspect` sees the old database first.
 */
export async function openUpgradedFixture(
	label: string,
	version: number,
	fixture: FrozenDb,
	inspect?: (storeNames: DOMStringList) => void
): Promise<CheckStore> {
	const name = uniqueDbName(label);
	const db = await openDB(name, version, {
		upgrade: (database, oldVersion, _newVersion, tx) =>
			applyStoreMigrations(database as never, tx as never, oldVersion, version)
	});
	inspect?.(db.objectStoreNames);
	const tx = db.transaction(['checks', 'drafts', 'meta'] as never, 'readwrite');
	const put = (store: string, value: unknown) => tx.objectStore(store as never).put(value as never);
	for (const record of fixture.records) await put('checks', record);
	for (const draft of fixture.drafts) await put('drafts', draft);
	for (const entry of fixture.meta) await put('meta', entry);
	await tx.done;
	db.close();
	const opened = await openStore(name);
	if (!opened.ok) throw new Error(opened.message);
	return opened.store;
}
