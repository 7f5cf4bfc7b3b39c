/**
 * Cases that between them reach every kind of sentence the engine writes with a figure in it:
 * section loss, a given Mp, a default steel strength, own fy, restraint positions, an overload,
 * a plastic hinge away from restraint, missing bearing lengths, a cantilever. Titles carry no
 * figures: a title is the user's own text and is never rewritten.
 */
const base = { format: 'hingepoint.case', version: 1 };

export const WORD_CASES: Record<string, unknown> = {
	'two spans, section loss, patterned imposed load': {
		...base,
		title: 'two spans',
		beam: {
			spans: [5, 7],
			supports: ['pin', 'pin', 'pin'],
			section: { shape: 'I', h: 406.4, b: 177.9, tw: 7.9, tf: 12.8, r: 10.2 },
			grade: 'S355',
			sectionLoss: 0.5
		},
		loads: [
			{ kind: 'uniform', from: 0, to: 12, value: 6, action: 'permanent' },
			{ kind: 'uniform', from: 0, to: 12, value: 2.5, action: 'imposed' },
			{ kind: 'linear', from: 8, to: 9.2, start: 10, end: 10, action: 'temporary' }
		]
	},
	'given Mp, restrained throughout': {
		...base,
		title: 'given Mp',
		beam: {
			spans: [6],
			supports: ['pin', 'pin'],
			section: { mp: 100 },
			restraint: { lateral: 'continuous' }
		},
		loads: [{ kind: 'point', x: 3, value: 10, action: 'temporary' }]
	},
	'overloaded by its permanent load': {
		...base,
		title: 'overloaded',
		beam: {
			spans: [6],
			supports: ['pin', 'pin'],
			section: { mp: 50, mass: 30 },
			restraint: { lateral: 'continuous' }
		},
		loads: [
			{ kind: 'uniform', from: 0, to: 6, value: 20, action: 'permanent' },
			{ kind: 'point', x: 2, value: 5, action: 'temporary' }
		]
	},
	'unknown old steel, restraint at two points, hoist under the bottom flange': {
		...base,
		title: 'old steel',
		beam: {
			spans: [6],
			supports: ['pin', 'pin'],
			section: { designation: 'UB 305x165x40' },
			grade: 'unknown-old',
			restraint: { lateral: [2.5, 4], loadHeight: 'bottom-flange' }
		},
		loads: [{ kind: 'point', x: 3, value: 12.6, action: 'temporary', label: 'hoist' }]
	},
	'own fy, fixed ends, restraint at the supports only': {
		...base,
		title: 'own fy',
		beam: {
			spans: [8],
			supports: ['fixed', 'fixed'],
			section: { designation: 'IPE 300' },
			grade: { fy: 300 },
			restraint: { lateral: 'ends-only' }
		},
		loads: [
			{ kind: 'uniform', from: 0, to: 8, value: 4, action: 'permanent' },
			{ kind: 'point', x: 2, value: 40, action: 'temporary' }
		]
	},
	'propped, restrained away from the hinge under the load': {
		...base,
		title: 'propped',
		beam: {
			spans: [6],
			supports: ['fixed', 'pin'],
			section: { designation: 'UB 305x165x40' },
			grade: 'S275',
			restraint: { lateral: [1, 5.5] }
		},
		loads: [{ kind: 'point', x: 3, value: 60, action: 'temporary' }]
	},
	'cantilever with a free tip': {
		...base,
		title: 'cantilever',
		beam: {
			spans: [6, 2],
			supports: ['fixed', 'pin', 'free'],
			section: { designation: 'UB 305x165x40' },
			grade: 'S275'
		},
		loads: [{ kind: 'point', x: 8, value: 5, action: 'temporary' }]
	},
	'no restraint given': {
		...base,
		title: 'no restraint',
		beam: {
			spans: [4.5],
			supports: ['pin', 'pin'],
			section: { designation: 'IPE 200' },
			grade: 'S235'
		},
		loads: [{ kind: 'uniform', from: 1, to: 3, value: 3, action: 'temporary' }]
	}
};
