/**
 * US customary units for the AISC validation tests, converted to the engine's N, mm, MPa.
 * Factors from NIST Special Publication 811 (2008), Appendix B: 1 in = 25.4 mm (exact),
 * 1 kip = 4 448.222 N (1 lbf = 4.448 221 615 260 5 N, exact), 1 ksi = 6.894 757 MPa.
 * Defined here, not imported from the engine, so the tests do not lean on the code they check.
 */
const MM_PER_IN = 25.4;
const N_PER_KIP = 4448.2216152605;
const MPA_PER_KSI = N_PER_KIP / MM_PER_IN ** 2;

/** Length: inches or feet → mm. */
export const inch = (v: number): number => v * MM_PER_IN;
export const ft = (v: number): number => v * 12 * MM_PER_IN;
/** Section properties: in², in³, in⁴, in⁶ → mm², mm³, mm⁴, mm⁶. */
export const in2 = (v: number): number => v * MM_PER_IN ** 2;
export const in3 = (v: number): number => v * MM_PER_IN ** 3;
export const in4 = (v: number): number => v * MM_PER_IN ** 4;
export const in6 = (v: number): number => v * MM_PER_IN ** 6;
/** Stress ksi → MPa; force kip → N; moment kip·in or kip·ft → N·mm. */
export const ksi = (v: number): number => v * MPA_PER_KSI;
export const kip = (v: number): number => v * N_PER_KIP;
export const kipIn = (v: number): number => v * N_PER_KIP * MM_PER_IN;
export const kipFt = (v: number): number => v * N_PER_KIP * MM_PER_IN * 12;
/** Back from the engine: mm → ft, N → kip, N·mm → kip·in and kip·ft. */
export const toFt = (mm: number): number => mm / (12 * MM_PER_IN);
export const toKip = (n: number): number => n / N_PER_KIP;
export const toKipIn = (nmm: number): number => nmm / (N_PER_KIP * MM_PER_IN);
export const toKipFt = (nmm: number): number => nmm / (N_PER_KIP * MM_PER_IN * 12);

/** E = 29 000 ksi, AISC 360-22 Symbols (from memory). */
export const E_KSI = 29_000;
