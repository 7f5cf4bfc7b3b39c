/**
 * The web of an I-shape under a force on a flange, AISC 360-22 J10 without stiffeners: the
 * least available strength of web local yielding (J10.2), web crippling (J10.3), web sidesway
 * buckling (J10.4, where the loaded flange is compressed and the flanges are not both held at
 * the force) and web compression buckling (J10.5, a force passing through to a support under
 * the other flange). The equations are in concentrated.ts.
 *
 * Our cautious choices, said in the row's note: forces are taken as compressive (a load hung
 * from the bottom flange is read like one bearing on it); the distance from the member end is
 * to the near edge of the bearing (the end rules of J10.2 and J10.3 then apply soonest); for J10.4 the rotational restraint of the loaded flange is taken
 * as unknown (the lower of the two cases that apply), and Cr follows the design moment at the
 * force (960 000 ksi below My, 480 000 ksi from My on).
 */
import type { WebForceInput, WebReading } from '../basis-types';
import {
	computeWebCompressionBuckling,
	computeWebCrippling,
	computeWebLocalYielding,
	computeWebSideswayBuckling,
	type WebForceStrength
} from './concentrated';
import { computeAvailableStrength, type AiscMethod } from './resistance';

const NAMES = {
	'J10.2': 'web local yielding',
	'J10.3': 'web crippling',
	'J10.4': 'web sidesway buckling',
	'J10.5': 'web compression buckling'
} as const;

type Key = keyof typeof NAMES;

/**
 * The web reading of an AISC basis at one force: with Cr = 960 000 ksi for J10.4, and, where
 * J10.4 applies, the reading with Cr = 480 000 ksi that holds from Mu = My (1.5Ma = My on ASD),
 * My = Fy·Sx of the member.
 */
export function computeAiscWebReading(
	o: WebForceInput,
	method: AiscMethod,
	yieldMoment: number
): WebReading {
	const below = readWeb(o, method, true);
	if (!below.sway) return below.reading;
	const above = readWeb(o, method, false).reading;
	const fromMoment = method === 'lrfd' ? yieldMoment : yieldMoment / 1.5;
	return { ...below.reading, highMoment: { fromMoment, reading: above } };
}

function readWeb(o: WebForceInput, method: AiscMethod, momentBelowYield: boolean) {
	const k = o.tf + o.r;
	const h = o.hw - 2 * o.r;
	const d = o.h;
	const distanceFromEnd = o.endDistance;
	const base = { tw: o.tw, tf: o.tf, d, E: o.E, Fyw: o.fyw, lb: o.ss, distanceFromEnd };
	const found: [Key, WebForceStrength][] = [
		['J10.2', computeWebLocalYielding({ ...base, k })],
		['J10.3', computeWebCrippling(base)]
	];
	if (o.throughWeb) found.push(['J10.5', computeWebCompressionBuckling({ ...base, h })]);
	else if (o.loadedFlangeCompressed && o.unbracedLength > 0) {
		const sway = computeWebSideswayBuckling({
			tw: o.tw,
			tf: o.tf,
			h,
			bf: o.bf,
			Lb: o.unbracedLength,
			compressionFlangeRestrained: 'unknown',
			momentBelowYield
		});
		found.push(['J10.4', sway]);
	}
	const strengths = found.flatMap(([key, s]) =>
		s.applies
			? [{ key, clause: s.clause, fRd: computeAvailableStrength(s.Rn, s.factors, method) }]
			: []
	);
	const least = strengths.reduce((a, b) => (b.fRd < a.fRd ? b : a));
	const listed = strengths.map((s) => `${NAMES[s.key]} ${(s.fRd / 1000).toFixed(1)} kN`).join(', ');
	const sway = strengths.some((s) => s.key === 'J10.4');
	const cr = momentBelowYield
		? '960 000 ksi (moment at the force below My)'
		: '480 000 ksi (moment at the force at or above My)';
	const swayWords = sway
		? ` J10.4 with the flange rotation restraint unknown (the lower case that applies) and Cr = ${cr}.`
		: '';
	const reading: WebReading = {
		fRd: least.fRd,
		kind: NAMES[least.key],
		place: o.throughWeb ? 'through' : distanceFromEnd <= d ? 'end' : 'span',
		clause: least.clause,
		note:
			`Available strengths: ${listed}; bearing length lb ${Math.round(o.ss)} mm, ` +
			`${Math.round(distanceFromEnd)} mm from the member end.${swayWords}`,
		values: { ss: o.ss },
		bendingInteraction: null
	};
	return { reading, sway };
}
