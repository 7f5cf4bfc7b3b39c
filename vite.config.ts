import { sveltekit } from '@sveltejs/kit/vite';
import { SvelteKitPWA } from '@vite-pwa/sveltekit';
import { defineConfig } from 'vitest/config';
import { appManifest } from './src/lib/pwa/manifest.ts';

export default defineConfig({
	plugins: [
		sveltekit(),
		SvelteKitPWA({
			// The user decides when to reload: a silent update could drop a half-filled check.
			registerType: 'prompt',
			// Registration happens in the root layout through virtual:pwa-register/svelte.
			injectRegister: false,
			manifest: appManifest,
			kit: {
				// Must match kit's own trailingSlash (default 'never') so precached URLs equal requested URLs.
				trailingSlash: 'never',
				adapterFallback: '200.html',
				includeVersionFile: true,
				// Puts the 200.html shell in the precache so unknown paths work offline (kit's SPA fallback).
				spa: true
			},
			workbox: {
				globPatterns: [
					'client/**/*.{js,css,ico,png,svg,webp,webmanifest}',
					'prerendered/**/*.{html,json}'
				],
				// A first visit must be controlled by the worker, or the page is never offline-capable.
				clientsClaim: true,
				cleanupOutdatedCaches: true
			}
		})
	],
	test: {
		include: ['test/{unit,validation,properties,storage}/**/*.test.ts'],
		environment: 'node',
		// Every test must assert something: a test that cannot fail is a defect.
		expect: { requireAssertions: true },
		setupFiles: ['test/support/fast-check-seed.ts'],
		testTimeout: 60_000
	}
});
