/**
 * Speed of the design checks (medians printed, never asserted): the single-span worked example
 * restrained and unrestrained, a Mcr evaluation alone, and multi-span beams whose imposed load
 * is patterned span by span (2 × 2^n arrangements per combination). Demo data (invented).
 */
import { checkCase } from '../../src/lib/engine/index';
import { computeCriticalMoment } from '../../src/lib/engine/checks/mcr';
import { medianMs } from './median';

const single = (restraint?: unknown) => ({
	format: 'hingepoint.case',
	version: 1,
	beam: {
		spans: [6],
		supports: ['pin', 'pin'],
		section: { designation: 'UB 305x165x40' },
		grade: 'S275',
		...(restraint ? { restraint } : {})
	},
	loads: [
		{ kind: 'uniform', from: 0, to: 6, value: 4, action: 'permanent' },
		{ kind: 'point', x: 3, value: 10, action: 'temporary' }
	]
});

const multi = (n: number, set: string) => ({
	format: 'hingepoint.case',
	version: 1,
	beam: {
		spans: Array.from({ length: n }, () => 6),
		supports: Array.from({ length: n + 1 }, () => 'pin'),
		section: { designation: 'UB 305x165x40' },
		grade: 'S275'
	},
	loads: [
		{ kind: 'uniform', from: 0, to: 6 * n, value: 3, action: 'permanent' },
		{ kind: 'uniform', from: 0, to: 6 * n, value: 4, action: 'imposed' },
		{ kind: 'point', x: 3, value: 20, action: 'temporary' }
	],
	factors: { set }
});

const run = (json: unknown) => {
	const out = checkCase(json);
	if (!out.ok) throw new Error('bench case invalid');
};

export function runChecksBench(): void {
	console.log(`single span, restrained: ${medianMs(() => run(single()), 20, 3).toFixed(1)} ms`);
	console.log(
		`single span, restrained at supports only (LTB): ${medianMs(() => run(single({ lateral: 'ends-only' })), 10, 2).toFixed(1)} ms`
	);
	const segment = {
		length: 6000,
		momentStart: 0,
		momentEnd: 0,
		loads: [{ kind: 'point' as const, x: 3000, value: 1e4 }]
	};
	const mcr = () =>
		computeCriticalMoment({ segment, EIz: 1.6e12, GIt: 1.2e10, EIw: 3.4e16, zg: 150 });
	console.log(`one Mcr (12 sine terms): ${medianMs(mcr, 200, 20).toFixed(2)} ms`);
	for (const [n, set] of [
		[2, 'en1990-6.10'],
		[3, 'en1990-6.10'],
		[3, 'en1990-6.10ab']
	] as const) {
		console.log(
			`${n} spans, imposed patterned, ${set}: ${medianMs(() => run(multi(n, set)), 3, 1).toFixed(0)} ms`
		);
	}
}
