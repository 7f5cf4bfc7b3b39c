import { describe, expect, it } from 'vitest';
import { contentKey, planImport } from '../../../src/lib/storage/backup-merge';
import type { CheckRecord } from '../../../src/lib/storage';
import { demoCase } from '../../storage/support';

function record(id: string, extra: Partial<CheckRecord> = {}): CheckRecord {
	return {
		id,
		schemaVersion: 3,
		title: 'Beam',
		place: { building: 'B', level: '', grid: '' },
		notes: '',
		createdAt: '2026-05-01T00:00:00.000Z',
		updatedAt: '2026-05-01T00:00:00.000Z',
		engineVersion: '1',
		input: demoCase(),
		result: null,
		computed: null,
		revisions: [],
		deletedAt: null,
		...extra
	};
}

function counter(): () => string {
	let n = 0;
	return () => `new-${++n}`;
}

// The same data with every object's keys in reverse order.
function reverseKeys(value: unknown): unknown {
	if (Array.isArray(value)) return value.map(reverseKeys);
	if (typeof value !== 'object' || value === null) return value;
	const entries = Object.entries(value).reverse();
	return Object.fromEntries(entries.map(([k, v]) => [k, reverseKeys(v)]));
}

describe('planImport', () => {
	it('adds a free id as it is, keeps a taken one beside under a new id, skips same content', () => {
		const here = [record('a'), record('b', { notes: 'here' })];
		const incoming = [record('a'), record('b', { notes: 'there' }), record('c', { notes: 'new' })];
		const plan = planImport(here, incoming, counter());
		expect(plan.counts).toEqual({ added: 1, beside: 1, skipped: 1, attention: 0, photos: 0 });
		expect(plan.writes.map((r) => [r.id, r.title])).toEqual([
			['new-1', 'Beam (imported)'],
			['c', 'Beam']
		]);
		// Photos follow: to the check already here, the copy kept beside, the check added as is.
		expect([...plan.targets]).toEqual([
			['a', 'a'],
			['b', 'new-1'],
			['c', 'c']
		]);
	});

	it('never marks a title twice, and names an untitled copy', () => {
		const here = [record('a'), record('b')];
		const incoming = [
			record('a', { title: 'Beam (imported)', notes: 'x' }),
			record('b', { title: '  ', notes: 'y' })
		];
		const titles = planImport(here, incoming, counter()).writes.map((r) => r.title);
		expect(titles).toEqual(['Beam (imported)', 'Untitled check (imported)']);
	});

	it('adds a record once when the file holds it twice under two ids', () => {
		const plan = planImport([], [record('a'), record('b')], counter());
		expect(plan.counts).toEqual({ added: 1, beside: 0, skipped: 1, attention: 0, photos: 0 });
		// The second one's photos go to the first, which is the check added.
		expect(plan.targets.get('b')).toBe('a');
	});

	it('counts added checks whose verdict needs attention', () => {
		const attention = { verdict: 'needs-attention' as const, computedBy: '1' };
		const plan = planImport(
			[record('a')],
			[record('a', { notes: 'x', computed: attention })],
			counter()
		);
		expect(plan.counts).toEqual({ added: 0, beside: 1, skipped: 0, attention: 1, photos: 0 });
	});

	it('treats key order, verdicts and results as not part of the content', () => {
		const reordered = reverseKeys(record('a')) as CheckRecord;
		expect(Object.keys(reordered)[0]).toBe('deletedAt');
		const claimed = record('a', {
			result: { verdict: 'pass' },
			computed: { verdict: 'pass', computedBy: 'x' }
		});
		expect(contentKey(reordered)).toBe(contentKey(record('a')));
		expect(contentKey(claimed)).toBe(contentKey(record('a')));
		expect(contentKey(record('a', { input: demoCase('UB', 7) }))).not.toBe(contentKey(record('a')));
	});
});
