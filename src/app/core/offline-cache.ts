import { isDevMode } from '@angular/core';

/** The service worker that the production build writes beside index.html (angular.json `serviceWorker`, ngsw-config.json). */
const WORKER_URL = '/ngsw-worker.js';

/**
 * Registers the service worker that keeps the app and the bench's reads for offline use, once the page
 * has loaded so that it never competes with the first page. Development builds have no worker.
 * The Angular service-worker package is not bundled: the app asks nothing of the worker but to run.
 */
export function registerServiceWorker(): void {
  if (isDevMode() || !('serviceWorker' in navigator)) return;
  const register = () => void navigator.serviceWorker.register(WORKER_URL, { scope: '/' }).catch((err: unknown) => console.error('The offline worker did not register:', err));
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}

/** The worker's caches of API answers (ngsw's data groups: `ngsw:/:<version>:data:<group>:cache`). */
const DATA_CACHE = /^ngsw:.*:data:.*:cache$/;

/**
 * Empties the API answers the worker keeps, so the jobs one member read never show to the next member
 * on a shared tablet; then asks again who is signed in, so that an offline start knows the new member.
 * The caches are emptied, not deleted: the worker holds them open, and a deleted cache would live on
 * under its hands.
 */
export async function forgetCachedAnswers(): Promise<void> {
  if (typeof caches === 'undefined') return;
  const names = (await caches.keys()).filter((name) => DATA_CACHE.test(name));
  await Promise.all(
    names.map(async (name) => {
      const cache = await caches.open(name);
      await Promise.all((await cache.keys()).map((request) => cache.delete(request)));
    }),
  );
  await fetch('/api/auth/session').catch(() => undefined);
}
