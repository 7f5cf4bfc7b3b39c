// Every page is prerendered so the service worker can precache the whole app for offline use.
export const prerender = true;
export const trailingSlash = 'never';
