/**
 * The library is shared by every caller: resolving a section must hand out copies, so a change
 * to a resolved section (say, by a form) never alters the tables for the next caller.
 */
import { describe, expect, it } from 'vitest';
import { findSection, resolveSection } from '../../../src/lib/engine/section/index';
import type { IDims } from '../../../src/lib/engine/section/index';

describe('library sharing', () => {
	it('resolveSection returns dims and props that are not the library objects', () => {
		const library = findSection('UB 305x165x40')!;
		const r = resolveSection({ designation: 'UB 305x165x40' });
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.value.dims).toEqual(library.dims);
		expect(r.value.dims).not.toBe(library.dims);
		expect(r.value.props).not.toBe(library.props);
		(r.value.dims as IDims).tf = 1;
		expect((findSection('UB 305x165x40')!.dims as IDims).tf).toBe(10.2);
	});
});
