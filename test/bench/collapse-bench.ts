/**
 * Speed of the collapse solver (medians printed, never asserted): one single-span check, a
 * five-span beam with 20 loads, a three-span capacity curve, and the same five-span problem solved
 * by the general-purpose LP solver HiGHS on a fine grid, side by side. Demo data (invented).
 */
import { solveCollapse } from '../../src/lib/engine/collapse';
import { makeProblem, type LoadSpec, type ProblemSpec } from '../unit/collapse/builders';
import { writeGridProgram } from '../unit/collapse/grid-program';
import { medianMs } from './median';

/** Simple span, 6 m, self-weight plus a trolley load at 1.2 m. */
const singleSpan: ProblemSpec = {
	spans: [6],
	supports: ['pin', 'pin'],
	Mp: 150,
	fixed: [{ w: 0.6, from: 0, to: 6 }],
	variable: [{ P: 12.6, at: 1.2 }]
};

function makeFiveSpan(): ProblemSpec {
	const loads: LoadSpec[] = [];
	for (let i = 0; i < 20; i++) {
		loads.push(
			i % 2 ? { P: 10 + i, at: 0.3 + i * 1.47 } : { w: 3 + i / 4, from: i * 1.4, to: i * 1.4 + 2.5 }
		);
	}
	return {
		spans: [6, 6, 6, 6, 6],
		supports: ['pin', 'pin', 'pin', 'pin', 'pin', 'pin'],
		Mp: [100, 120, 100, 90, 100],
		fixed: loads.slice(0, 10),
		variable: loads.slice(10)
	};
}

const format = (ms: number) =>
	`${ms < 0.1 ? (ms * 1000).toFixed(1) + ' µs' : ms.toFixed(3) + ' ms'}`;

/** Prints medians for the collapse solver and the HiGHS comparison. */
export async function runCollapseBench(): Promise<void> {
	const one = makeProblem(singleSpan);
	console.log(
		`single-span check:              ${format(medianMs(() => solveCollapse(one), 2000, 200))}`
	);
	const fiveSpec = makeFiveSpan();
	const five = makeProblem(fiveSpec);
	const fiveMs = medianMs(() => solveCollapse(five), 200, 20);
	console.log(`five spans, 20 loads:           ${format(fiveMs)}`);
	const highs = await (await import('highs')).default();
	const exact = solveCollapse(five);
	for (const perBeam of [300, 1500]) {
		let lambdaGrid = NaN;
		const gridMs = medianMs(
			() => {
				lambdaGrid = highs.solve(writeGridProgram(fiveSpec, perBeam), {
					output_flag: false
				}).ObjectiveValue;
			},
			7,
			1
		);
		const lambda = exact.status === 'mechanism' ? exact.loadFactor : NaN;
		console.log(
			`HiGHS, five spans, grid ${perBeam} per beam: ${format(gridMs)}  (ratio to exact solver ${(gridMs / fiveMs).toFixed(0)}×; ` +
				`λ_grid ${lambdaGrid.toPrecision(10)} vs exact ${lambda.toPrecision(10)})`
		);
	}
}
