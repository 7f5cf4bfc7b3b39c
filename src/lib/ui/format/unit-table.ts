import { US } from '$lib/engine/units';
import type { Quantity, UnitSystem } from './types';

/** One display unit: its symbol and how many SI units one display unit is. */
export interface DisplayUnit {
	symbol: string;
	/** SI value of one display unit (e.g. 0.3048 m per ft). */
	toSI: number;
	/** Decimal places shown when the caller does not say. */
	digits: number;
}

/**
 * Display units per quantity and system. US factors come from the exact definitions of the inch
 * (25.4 mm) and the pound (0.453 592 37 kg × 9.806 65 m/s²), as listed in NIST SP 811 Appendix B.
 */
export const DISPLAY_UNITS: Readonly<Record<Quantity, Record<UnitSystem, DisplayUnit>>> = {
	length: {
		SI: { symbol: 'm', toSI: 1, digits: 2 },
		US: { symbol: 'ft', toSI: US.ftToM, digits: 2 }
	},
	force: {
		SI: { symbol: 'kN', toSI: 1, digits: 1 },
		US: { symbol: 'kip', toSI: US.kipToKN, digits: 2 }
	},
	lineLoad: {
		SI: { symbol: 'kN/m', toSI: 1, digits: 2 },
		// kip/ft → kN/m: (kip → kN) / (ft → m)
		US: { symbol: 'kip/ft', toSI: US.kipToKN / US.ftToM, digits: 3 }
	},
	moment: {
		SI: { symbol: 'kNm', toSI: 1, digits: 1 },
		// kip-ft → kNm: (kip → kN) × (ft → m)
		US: { symbol: 'kip-ft', toSI: US.kipToKN * US.ftToM, digits: 1 }
	},
	dimension: {
		SI: { symbol: 'mm', toSI: 1, digits: 1 },
		US: { symbol: 'in', toSI: US.inToMm, digits: 3 }
	},
	stress: {
		SI: { symbol: 'MPa', toSI: 1, digits: 0 },
		US: { symbol: 'ksi', toSI: US.ksiToMPa, digits: 1 }
	}
};

/**
 * The display unit for a quantity in a unit system.
 * @example
 * findDisplayUnit('moment', 'US').symbol // 'kip-ft'
 */
export function findDisplayUnit(quantity: Quantity, units: UnitSystem): DisplayUnit {
	return DISPLAY_UNITS[quantity][units];
}
