/**
 * The engineer-of-record notice. Every result carries it and the app shows it on first run,
 * on every screen's footer link and on every result. Wording is ours.
 */
export const ENGINEER_NOTICE_SHORT =
	'Screening aid only. The engineer of record decides; local codes and licensed practice govern.';

export const ENGINEER_NOTICE_FULL = [
	'Hingepoint is a screening aid for a competent person on site. It is not a design and not an approval.',
	'Every answer rests on what was entered: span, supports, section, steel grade and loads. Measure them; when in doubt, assume the weaker value.',
	'The engineer of record for the structure, or a temporary-works designer appointed for the job, decides whether the load may go on the beam. Local codes, national annexes, site rules and licensed practice govern over anything shown here.',
	'Not checked: connections, supports and what holds them up, bearing walls and padstones, fatigue, impact beyond the factor entered, vibration, fire damage, hidden defects, cast or wrought iron.',
	'If anything looks wrong — cracks, distortion, heavy corrosion, unknown material — stop and ask an engineer.'
];
