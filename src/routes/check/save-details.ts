import type { Place } from '$lib/storage';

/** What the person types when saving a check. */
export interface SaveDetails {
	title: string;
	place: Place;
	notes: string;
}
