// Private browsing and locked-down browsers: no IndexedDB at all, or one whose open() fails. The
// app must still open and compute; storage says plainly that nothing can be saved. This file
// deliberately does not load fake-indexeddb.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { openStore } from '../../src/lib/storage';
import { FAILURE_MESSAGES } from '../../src/lib/storage/errors';
import { SavedChecks, NO_STORAGE_MESSAGE } from '../../src/lib/ui/state/saved-checks.svelte';
import { recomputeVerdict } from '../../src/lib/ui/state/recompute-verdict';
import hoist from '../fixtures/cases/demo-hoist-on-ub.json';

afterEach(() => {
	vi.unstubAllGlobals();
});

describe('no IndexedDB', () => {
	it('opening the store fails with the plain storage message instead of throwing', async () => {
		vi.stubGlobal('indexedDB', undefined);
		const opened = await openStore('no-idb');
		expect(opened).toEqual({ ok: false, reason: 'storage', message: FAILURE_MESSAGES.storage });
		expect(FAILURE_MESSAGES.storage).toMatch(/private browsing/);
	});

	it('an open() that throws (storage blocked) is the same plain failure', async () => {
		vi.stubGlobal('indexedDB', {
			open: () => {
				throw new DOMException('The operation is insecure.', 'SecurityError');
			}
		});
		const opened = await openStore('blocked-idb');
		expect(opened).toMatchObject({ ok: false, reason: 'storage' });
	});

	it('the saved-checks screen opens, says checks cannot be saved, and offers no import', async () => {
		vi.stubGlobal('indexedDB', undefined);
		const saved = new SavedChecks();
		await saved.refresh();
		expect(saved.loaded).toBe(true);
		expect(saved.available).toBe(false);
		expect(saved.records).toEqual([]);
		expect(saved.message).toBe(NO_STORAGE_MESSAGE);
	});

	it('a check is still computed: the engine needs no storage', () => {
		vi.stubGlobal('indexedDB', undefined);
		expect(recomputeVerdict(hoist)).toBe('pass');
	});
});
