/**
 * Elastic moments and deflections under the unfactored loads, read from the load groups the
 * checks already analysed (no second analysis). These are action effects, not resistances.
 */
import type { LocatedValue } from '../elastic/index';
import type { CharacteristicEffects } from './inputs';
import type { LoadEffects } from './load-effects';
import type { SpanMember } from './member';

const NO_STIFFNESS =
	'Moments need the stiffness of each span: a span is given by its Mp only and the spans differ.';
const NO_SECTION = 'Deflections need the section’s Iy: the section is given by its Mp only.';

/**
 * Moments and deflections of the characteristic loads.
 * @param stiffnessKnown true when every span's E·Iy was used (else a common placeholder)
 */
export function summariseCharacteristicEffects(
	effects: LoadEffects,
	members: SpanMember[],
	stiffnessKnown: boolean
): CharacteristicEffects {
	const notAvailable: string[] = [];
	const all = effects.characteristic.all;
	// With a placeholder EI moments are right only when every span has the same section.
	const uniform = members.every(
		(m) => m.designation === members[0].designation && m.mp === members[0].mp
	);
	if (!all || (!stiffnessKnown && !uniform)) {
		if (!stiffnessKnown && !uniform) notAvailable.push(NO_STIFFNESS);
		return { maxMoment: null, maxDeflection: null, notAvailable };
	}
	const maxMoment = { ...all.maxMoment };
	if (!stiffnessKnown) {
		notAvailable.push(NO_SECTION);
		return { maxMoment, maxDeflection: null, notAvailable };
	}
	const temporary = effects.characteristic.temporary;
	return {
		maxMoment,
		maxDeflection: {
			total: findLargest(all.maxDeflection.spans),
			temporary: temporary ? findLargest(temporary.maxDeflection.spans) : null,
			spans: all.maxDeflection.spans.map((s) => ({ x: s.x, value: s.value }))
		},
		notAvailable
	};
}

/** Largest |deflection| over the spans, with its span index. */
function findLargest(spans: LocatedValue[]): LocatedValue & { span: number } {
	let span = 0;
	spans.forEach((s, i) => {
		if (Math.abs(s.value) > Math.abs(spans[span].value)) span = i;
	});
	return { x: spans[span].x, value: spans[span].value, span };
}
