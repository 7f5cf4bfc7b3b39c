/**
 * The web app manifest. Kept in one module so the build config and the tests read the same object.
 * Colours are the app's own: a deep slate ground with a signal-orange mark.
 */
export const appManifest = {
	id: '/',
	name: 'Hingepoint — steel beam load check',
	short_name: 'Hingepoint',
	description:
		'Checks on site, offline, whether an existing steel beam can take a temporary load: plastic collapse, member checks and the largest load allowed.',
	start_url: '/',
	scope: '/',
	display: 'standalone' as const,
	orientation: 'portrait' as const,
	theme_color: '#1f2a36',
	background_color: '#f4f1ea',
	icons: [
		{ src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
		{ src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
		{
			src: '/icons/icon-maskable-512.png',
			sizes: '512x512',
			type: 'image/png',
			purpose: 'maskable'
		}
	]
};
