/** Plain names for the engine's check ids. */
export const CHECK_LABELS: Readonly<Record<string, string>> = {
	collapse: 'Plastic collapse',
	bending: 'Bending',
	shear: 'Shear',
	'bending-shear': 'Bending with shear',
	interaction: 'Bending with shear',
	ltb: 'Lateral-torsional buckling',
	web: 'Web under point loads and supports',
	deflection: 'Deflection',
	'fixed-loads': 'Existing loads alone'
};
