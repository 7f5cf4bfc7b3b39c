/**
 * EN 1991-1-6:2005 Annex A1 Table A1.1: construction loads take ψ0 = 1.0 (recommended value,
 * from memory). So when existing imposed load leads in EN 1990 6.10,
 * ΣγG·Gk + γQ·Qk,1 + ΣγQ·ψ0,i·Qk,i, the proposed temporary (construction) load accompanies at
 * its full value.
 * Worked by hand: a simply supported 6 m beam, Mp = 623 cm³ × 275 N/mm² (305x165x40 UB S275),
 * gk = 4 kN/m, existing imposed qk = 3 kN/m, temporary Qk at midspan. The midspan hinge closes
 * γG·gk·L²/8 + γQ·qk·L²/8 + γT·ψ·Qk·L/4 = Mp (B.G. Neal, The Plastic Methods of Structural
 * Analysis, from memory): imposed leading, Qk = (Mp − (1.35·4 + 1.5·3)·L²/8)·4 / (1.5·1.0·L).
 */
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/lib/engine/case/index';
import { buildDesignCheckInput } from '../../src/lib/engine/checks/from-case';
import { resolveFactors } from '../../src/lib/engine/checks/en1993/factors';
import { applyArrangement } from '../../src/lib/engine/checks/factor-loads';
import { listLoadArrangements } from '../../src/lib/engine/checks/load-arrangements';
import type { Load } from '../../src/lib/engine/model/types';
import { expectRel } from '../support/expect-rel';

const L = 6000;
const Mp = 623e3 * 275;
const loads: Load[] = [
	{ kind: 'uniform', from: 0, to: L, value: 4, action: 'permanent' },
	{ kind: 'uniform', from: 0, to: L, value: 3, action: 'imposed' },
	{ kind: 'point', x: L / 2, value: 1000, action: 'temporary' }
];

/** Least Qk (kN) over every arrangement of 6.10, by the midspan-hinge closed form. */
function leastQk(psi0T?: number): { qk: number; name: string } {
	const f = resolveFactors({ set: 'en1990-6.10', psi0T }, { hasImposed: true });
	const options = { combinations: f.combinations, spanCount: 1, imposedSpans: [0] };
	const all = listLoadArrangements(options);
	let best = { qk: Infinity, name: '' };
	for (const arrangement of all) {
		const d = applyArrangement({ loads, spans: [L], arrangement });
		const w = d.fixed.reduce((s, l) => s + (l.kind === 'uniform' ? l.value : 0), 0);
		const q = d.variable.reduce((s, l) => s + (l.kind === 'point' ? l.value : 0), 0) / 1000;
		const qk = ((Mp - (w * L * L) / 8) * 4) / (q * L) / 1000;
		if (qk < best.qk) best = { qk, name: arrangement.name };
	}
	return best;
}

describe('ψ0 of the temporary (construction) load', () => {
	it('defaults to 1.0: with imposed load leading, the temporary load keeps γQ = 1.5', () => {
		const f = resolveFactors({ set: 'en1990-6.10' }, { hasImposed: true });
		const imposedLeading = f.combinations.find((c) => c.name.includes('imposed leading'))!;
		expect(imposedLeading.gammaImposed).toBe(1.5);
		expectRel(imposedLeading.gammaTemporary, 1.5 * 1.0, 1e-12);
	});

	it('6.10 with imposed load leading governs: Qk by hand 56.34 kN', () => {
		const byHand = ((Mp - ((1.35 * 4 + 1.5 * 3) * L * L) / 8) * 4) / (1.5 * 1.0 * L) / 1000;
		const r = leastQk();
		expectRel(r.qk, byHand, 1e-9);
		expectRel(r.qk, 56.34, 1e-3);
		expect(r.name).toContain('imposed leading');
	});

	it('with the imposed-load ψ0 = 0.7 taken for it the answer would be 59.04 kN, unsafe', () => {
		// Temporary leading then governs: 1.35·gk + 1.5·0.7·qk with the temporary load at 1.5.
		const byHand = ((Mp - ((1.35 * 4 + 1.5 * 0.7 * 3) * L * L) / 8) * 4) / (1.5 * L) / 1000;
		expectRel(leastQk(0.7).qk, byHand, 1e-9);
		expect(leastQk(0.7).qk).toBeGreaterThan(leastQk().qk);
	});

	it('the case file reads factors.psi0Temporary and hands it to the checks', () => {
		const file = {
			format: 'hingepoint.case',
			version: 1,
			beam: { spans: [6], supports: ['pin', 'pin'], section: { mp: 100 } },
			loads: [],
			factors: { psi0Temporary: 0.8 }
		};
		const r = parseCase(file);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(buildDesignCheckInput(r.value).factors.psi0T).toBe(0.8);
		const { psi0Temporary: _, ...rest } = file.factors;
		const d = parseCase({ ...file, factors: rest });
		expect(d.ok && buildDesignCheckInput(d.value).factors.psi0T).toBeUndefined();
	});
});
