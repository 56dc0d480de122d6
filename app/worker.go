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
//     so the site works offline under a sub-path too;
//   - installation fetches every file past the browser's HTTP cache, so a
//     host's cache headers cannot mix files of two versions in one cache;
//   - caches are named after the site's folder URL and the version
//     ("fieldhead@<folder URL>#<version>"): activation deletes only this
//     site's older caches, never those of another copy on the same origin,
//     and the page can tell that a newer version took over (update.go).
const workerJS = `// Fieldhead service worker, version {{.Version}}.
const pageURL = new URL("./", self.location).href;
const cachePrefix = "fieldhead@" + pageURL + "#";
const cacheName = cachePrefix + "{{.Version}}";
const resourcesToCache = {{.ResourcesToCache}};

self.addEventListener("install", (event) => {
  event.waitUntil((async () => {
    const cache = await caches.open(cacheName);
    await cache.addAll(resourcesToCache.map((url) => new Request(url, { cache: "reload" })));
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
      if (key !== cacheName && (key.startsWith(cachePrefix) || key.startsWith("fieldhead-"))) {
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
