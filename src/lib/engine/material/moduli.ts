import { E_STEEL, G_STEEL, US } from '../units';

/** Elastic and shear moduli of structural steel on one design basis, N/mm². */
export interface SteelModuli {
	E: number;
	G: number;
	/** Where the values come from. */
	source: string;
}

/** EN 1993-1-1 3.2.6: E = 210 000 N/mm², G ≈ 81 000 N/mm². */
export const EUROCODE_MODULI: SteelModuli = {
	E: E_STEEL,
	G: G_STEEL,
	source: 'EN 1993-1-1 3.2.6'
};

/**
 * AISC 360 (Symbols and Chapter B): E = 29 000 ksi, G = 11 200 ksi (from memory), kept exact in
 * N/mm² (199 948 and 77 221) so that a US case gives the ksi-based answer of the Specification.
 */
export const AISC_MODULI: SteelModuli = {
	E: 29_000 * US.ksiToMPa,
	G: 11_200 * US.ksiToMPa,
	source: 'AISC 360-22 Symbols: E = 29 000 ksi, G = 11 200 ksi (from memory)'
};
