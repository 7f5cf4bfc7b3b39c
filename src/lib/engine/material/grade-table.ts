import type { GradeRow } from './types';
import { US } from '../units';

const ksi = (value: number): number => Math.round(value * US.ksiToMPa * 10) / 10;
const EN_10025_2 = 'EN 10025-2:2004 Table 7';
const EN_SOURCE = '[C, secondary: reproduction of BS EN 10025-2:2004 Table 7]';

/**
 * Steel grades as data, each with its source tag (engineering reference B.1, C.1, E.2).
 * fu is the lower end of the standard's range for 3 ≤ t ≤ 100 mm, then the lower ranges above.
 */
export const GRADE_ROWS: readonly GradeRow[] = [
	{
		id: 'S235', name: 'S235 (EN 10025-2)', standard: EN_10025_2, source: EN_SOURCE,
		bands: [
			{ upTo: 16, fy: 235, fu: 360 }, { upTo: 40, fy: 225, fu: 360 }, { upTo: 63, fy: 215, fu: 360 },
			{ upTo: 80, fy: 215, fu: 360 }, { upTo: 100, fy: 215, fu: 360 }, { upTo: 150, fy: 195, fu: 350 },
			{ upTo: 200, fy: 185, fu: 340 }, { upTo: 250, fy: 175, fu: 340 }
		]
	},
	{
		id: 'S275', name: 'S275 (EN 10025-2)', standard: EN_10025_2, source: EN_SOURCE,
		bands: [
			{ upTo: 16, fy: 275, fu: 410 }, { upTo: 40, fy: 265, fu: 410 }, { upTo: 63, fy: 255, fu: 410 },
			{ upTo: 80, fy: 245, fu: 410 }, { upTo: 100, fy: 235, fu: 410 }, { upTo: 150, fy: 225, fu: 400 },
			{ upTo: 200, fy: 215, fu: 380 }, { upTo: 250, fy: 205, fu: 380 }
		]
	},
	{
		id: 'S355', name: 'S355 (EN 10025-2)', standard: EN_10025_2, source: EN_SOURCE,
		bands: [
			{ upTo: 16, fy: 355, fu: 470 }, { upTo: 40, fy: 345, fu: 470 }, { upTo: 63, fy: 335, fu: 470 },
			{ upTo: 80, fy: 325, fu: 470 }, { upTo: 100, fy: 315, fu: 470 }, { upTo: 150, fy: 295, fu: 450 },
			{ upTo: 200, fy: 285, fu: 450 }, { upTo: 250, fy: 275, fu: 450 }
		]
	},
	{
		id: 'S460', name: 'S460 M/ML (EN 10025-4)', standard: 'EN 10025-4 (S460M/ML)',
		source: '[M: EN 10025-4 thickness steps; EN 1993-1-1 Table 3.1 fu]',
		note: 'S460 is not in EN 10025-2:2004; these are the thermomechanically rolled S460M/ML values (EN 10025-3 S460N/NL has the same yield steps).',
		bands: [
			{ upTo: 16, fy: 460, fu: 540 }, { upTo: 40, fy: 440, fu: 540 }, { upTo: 63, fy: 430, fu: 530 },
			{ upTo: 80, fy: 410, fu: 530 }, { upTo: 100, fy: 400, fu: 530 }
		]
	},
	{
		id: 'A36', name: 'ASTM A36', standard: 'ASTM A36', source: '[C, secondary: summary of AISC Manual Table 2-4]',
		bands: [{ upTo: 250, fy: ksi(36), fu: ksi(58) }]
	},
	{
		id: 'A992', name: 'ASTM A992', standard: 'ASTM A992',
		source: '[C: AISC Modern Steel Construction, "Are You Properly Specifying Materials?" (2009)]',
		bands: [{ upTo: 250, fy: ksi(50), fu: ksi(65) }]
	},
	{
		id: 'A572-50', name: 'ASTM A572 Grade 50', standard: 'ASTM A572', source: '[M: ASTM A572 Gr 50]',
		bands: [{ upTo: 250, fy: ksi(50), fu: ksi(65) }]
	},
	{
		id: 'unknown-old', name: 'Older steel, grade unknown', standard: 'Lower bound for unidentified mild steel',
		source: '[C: CISC guidance on historical structural steels, 210 / 380 MPa] [P: app default]',
		needsConfirmation: true,
		note: 'A conservative lower bound pending coupon tests. Confirm the member is steel, not cast or wrought iron.',
		bands: [{ upTo: 250, fy: 210, fu: 380 }]
	}
];
