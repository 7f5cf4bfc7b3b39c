import { isCaseBasis, type CaseBasis } from '$lib/engine/case/types';
import type { UnitSystem } from '$lib/ui/format/types';
import { isPlainObject } from './case-file';

/** Colour theme; 'contrast' is for bright daylight on site. */
export type Theme = 'light' | 'dark' | 'contrast';
/** EN 1990 combination rule for the ultimate limit state (STR). */
export type Combination = '6.10' | '6.10a/b';
/** Lateral restraint of the compression flange assumed for a new check. */
export type LateralRestraint = 'continuous' | 'ends-only';

/** A named set of partial and combination factors (all dimensionless). */
export interface FactorSet {
	id: string;
	name: string;
	combination: Combination;
	/** γG (unfavourable permanent), γG,inf (favourable permanent). */
	gammaG: number;
	gammaGinf: number;
	/** γQ for imposed loads already on the beam; γtemp for the proposed temporary load. */
	gammaQ: number;
	gammaTemp: number;
	/** Resistance factors γM0 (cross-sections) and γM1 (member buckling). */
	gammaM0: number;
	gammaM1: number;
	/** ξ reduction on unfavourable permanent loads in 6.10b; ψ0 combination factor. */
	xi: number;
	psi0: number;
}

/** User settings. Stored values are SI whatever `units` says. */
export interface Settings {
	units: UnitSystem;
	/** Design basis of a new check (each check may change it); separate from units. */
	defaultBasis: CaseBasis;
	/** The user's own factor sets (the built-in ones are not stored). */
	factorSets: FactorSet[];
	activeFactorSetId: string;
	/** Deflection limit as span / this number. */
	deflectionLimit: number;
	defaultRestraint: LateralRestraint;
	userName: string;
	company: string;
	theme: Theme;
}

const EN1990_RECOMMENDED = {
	// EN 1990 Table A1.2(B), recommended values for set B (STR).
	gammaG: 1.35,
	gammaGinf: 1.0,
	gammaQ: 1.5,
	// The temporary load is a variable action, so it takes γQ of Table A1.2(B).
	gammaTemp: 1.5,
	// EN 1993-1-1 6.1 Note 2B, recommended.
	gammaM0: 1.0,
	gammaM1: 1.0,
	// EN 1990 Table A1.2(B) note: recommended ξ = 0.85.
	xi: 0.85,
	// EN 1990 Table A1.1, imposed loads in buildings, categories A–D (from memory).
	psi0: 0.7
};

const BUILT_IN: FactorSet[] = [
	{
		id: 'en1990-6.10',
		name: 'EN 1990 (6.10), recommended',
		combination: '6.10',
		...EN1990_RECOMMENDED
	},
	{
		id: 'en1990-6.10ab',
		name: 'EN 1990 (6.10a/b), recommended',
		combination: '6.10a/b',
		...EN1990_RECOMMENDED
	}
];

/** Factor sets that ship with the app; frozen, they cannot be edited or deleted. */
export const BUILT_IN_FACTOR_SETS: readonly Readonly<FactorSet>[] = Object.freeze(
	BUILT_IN.map((set) => Object.freeze(set))
);

/** Settings on first run (frozen). span/200 is common practice for beams under variable load. */
export const DEFAULT_SETTINGS: Readonly<Settings> = Object.freeze<Settings>({
	units: 'SI',
	defaultBasis: 'eurocode',
	factorSets: [],
	activeFactorSetId: 'en1990-6.10',
	deflectionLimit: 200,
	// The cautious assumption: only the supports hold the compression flange.
	defaultRestraint: 'ends-only',
	userName: '',
	company: '',
	theme: 'light'
});

/**
 * Settings read from storage, field by field: anything missing or malformed takes its default,
 * so a damaged or older entry never breaks the app. Does not mutate its argument.
 */
export function sanitizeSettings(raw: unknown): Settings {
	const s = isPlainObject(raw) ? raw : {};
	const d = DEFAULT_SETTINGS;
	const factorSets = Array.isArray(s.factorSets) ? s.factorSets.filter(isFactorSet) : [];
	const ids = new Set([...BUILT_IN_FACTOR_SETS, ...factorSets].map((f) => f.id));
	return {
		units: s.units === 'SI' || s.units === 'US' ? s.units : d.units,
		defaultBasis: isCaseBasis(s.defaultBasis) ? s.defaultBasis : d.defaultBasis,
		factorSets: factorSets.map((f) => ({ ...f })),
		activeFactorSetId:
			typeof s.activeFactorSetId === 'string' && ids.has(s.activeFactorSetId)
				? s.activeFactorSetId
				: d.activeFactorSetId,
		deflectionLimit: isPositive(s.deflectionLimit)
			? (s.deflectionLimit as number)
			: d.deflectionLimit,
		defaultRestraint:
			s.defaultRestraint === 'continuous' || s.defaultRestraint === 'ends-only'
				? s.defaultRestraint
				: d.defaultRestraint,
		userName: typeof s.userName === 'string' ? s.userName : d.userName,
		company: typeof s.company === 'string' ? s.company : d.company,
		theme: s.theme === 'light' || s.theme === 'dark' || s.theme === 'contrast' ? s.theme : d.theme
	};
}

/** Every factor set the user can pick: built-in first, then their own. */
export function listFactorSets(settings: Settings): FactorSet[] {
	return [...BUILT_IN_FACTOR_SETS, ...settings.factorSets];
}

/** The factor set in use (falls back to the default built-in one). */
export function findActiveFactorSet(settings: Settings): FactorSet {
	const all = listFactorSets(settings);
	return all.find((f) => f.id === settings.activeFactorSetId) ?? BUILT_IN_FACTOR_SETS[0];
}

/**
 * Settings with an own factor set added, or replaced when its id exists; an invalid set or a
 * built-in id is refused with a message. Pure.
 */
export function withFactorSet(
	settings: Settings,
	set: FactorSet
): { ok: true; value: Settings } | { ok: false; message: string } {
	if (!isFactorSet(set)) {
		return {
			ok: false,
			message: 'A factor set needs a name, factors above zero, ξ up to 1 and ψ0 from 0 to 1.'
		};
	}
	const others = settings.factorSets.filter((f) => f.id !== set.id);
	return { ok: true, value: { ...settings, factorSets: [...others, { ...set }] } };
}

/** Settings without an own factor set; an active set that goes falls back to the default. Pure. */
export function withoutFactorSet(settings: Settings, id: string): Settings {
	const factorSets = settings.factorSets.filter((f) => f.id !== id);
	const activeFactorSetId =
		settings.activeFactorSetId === id
			? DEFAULT_SETTINGS.activeFactorSetId
			: settings.activeFactorSetId;
	return { ...settings, factorSets, activeFactorSetId };
}

const FACTOR_KEYS = ['gammaG', 'gammaGinf', 'gammaQ', 'gammaTemp', 'gammaM0', 'gammaM1'];

/** Whether a value is a usable factor set: positive factors, 0 < ξ ≤ 1, 0 ≤ ψ0 ≤ 1. */
export function isFactorSet(value: unknown): value is FactorSet {
	if (!isPlainObject(value)) return false;
	const v = value;
	return (
		typeof v.id === 'string' &&
		v.id !== '' &&
		!BUILT_IN_FACTOR_SETS.some((b) => b.id === v.id) &&
		typeof v.name === 'string' &&
		(v.combination === '6.10' || v.combination === '6.10a/b') &&
		FACTOR_KEYS.every((k) => isPositive(v[k])) &&
		isPositive(v.xi) &&
		(v.xi as number) <= 1 &&
		typeof v.psi0 === 'number' &&
		v.psi0 >= 0 &&
		v.psi0 <= 1
	);
}

function isPositive(value: unknown): boolean {
	return typeof value === 'number' && Number.isFinite(value) && value > 0;
}
