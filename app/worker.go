//go:build !wasm

package main

// workerJS is our service worker template (go-app fills in {{.Version}} and
// {{.ResourcesToCache}}). It differs from go-app's default where a field tool
// needs it:
//   - installation waits until every file is cached;
//   - a page request matches the cached page whatever its query string, so a
//     share link or a bookmark opens with no network (the query is the
//     scenario, and the page reads it itself);
//   - the page is also cached under the folder URL the site is served from,
//     so the site works offline under a sub-path too.
const workerJS = `// Fieldhead service worker, version {{.Version}}.
const cacheName = "fieldhead-" + "{{.Version}}";
const resourcesToCache = {{.ResourcesToCache}};
const pageURL = new URL("./", self.location).href;

self.addEventListener("install", (event) => {
  event.waitUntil((async () => {
    const cache = await caches.open(cacheName);
    await cache.addAll(resourcesToCache);
    const page = await fetch(pageURL, { cache: "reload" });
    if (page.ok) {
      await cache.put(pageURL, page);
    }
    await self.skipWaiting();
  })());
});

self.addEventListener("activate", (event) => {
  event.waitUntil((async () => {
    for (const key of await caches.keys()) {
      if (key !== cacheName) {
        await caches.delete(key);
      }
    }
    await self.clients.claim();
  })());
});

self.addEventListener("fetch", (event) => {
  const request = event.request;
  if (request.method !== "GET") {
    return;
  }
  event.respondWith((async () => {
    const cache = await caches.open(cacheName);
    if (request.mode === "navigate") {
      const page = (await cache.match(request, { ignoreSearch: true })) ||
        (await cache.match(pageURL));
      if (page && page.redirected) {
        return new Response(await page.blob(), { status: page.status, headers: page.headers });
      }
      if (page) {
        return page;
      }
      return fetch(request);
    }
    const hit = await cache.match(request);
    return hit || fetch(request);
  })());
});
`
