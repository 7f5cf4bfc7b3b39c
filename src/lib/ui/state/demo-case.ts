import { BLANK } from './blank-value';
import type { CaseFile } from './case-file';

/** Title prefix that marks a demo record wherever it is shown or shared. */
export const DEMO_MARK = 'DEMO';

/**
 * The check shown on first open. INVENTED DEMO DATA: a beam over a basement plant room that is to
 * carry a 1 t chain hoist while a pump is changed. Not a real building, not design values.
 */
export function createDemoCase(): CaseFile {
	return {
		format: 'hingepoint.case',
		version: 1,
		title: `${DEMO_MARK} — plant room beam, pump change hoist`,
		beam: {
			spans: [4.8],
			supports: ['pin', 'pin'],
			joints: [],
			section: { designation: 'UB 254x146x31' },
			grade: 'S275',
			sectionLoss: 0,
			selfWeight: true,
			restraint: { lateral: 'continuous', loadHeight: 'bottom-flange' },
			bearing: [100, 100],
			bearingLoads: 50
		},
		loads: [
			{ kind: 'uniform', from: 0, to: 4.8, value: 3.2, action: 'permanent' },
			{ kind: 'uniform', from: 0, to: 4.8, value: 1.5, action: 'imposed' },
			// Demo chain hoist: 10.1 kN × dynamic factor 1.25.
			{ kind: 'point', x: 2.1, value: 12.625, action: 'temporary' }
		],
		factors: {
			set: 'en1990-6.10',
			permanent: 1.35,
			imposed: 1.5,
			temporary: 1.5,
			gammaM0: 1,
			gammaM1: 1
		},
		deflectionLimit: 200
	};
}

/** A fresh case with one simply supported span of unknown length, and no loads or section yet. */
export function createBlankCase(): CaseFile {
	const demo = createDemoCase();
	return {
		...demo,
		title: '',
		// No bearing lengths: the engine's own (cautious) defaults apply until the engineer enters them.
		// The span and section start empty: nothing on screen that could pass for a measurement.
		beam: {
			...demo.beam,
			spans: [BLANK],
			section: { designation: '' },
			sectionLoss: 0,
			bearing: undefined,
			bearingLoads: undefined
		},
		loads: []
	};
}
