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
//   - one download: the page registers the worker only once its wasm is
//     running (loader.go), so installation finds every file in the HTTP
//     cache. A file with a content-hashed name (internal/static) is taken
//     from there as it is: its name is its version, so no copy of another
//     build can be mixed in. The manifest is revalidated (a 304 when
//     unchanged). The page is the one the visit loaded, if the HTTP cache
//     holds it and it names this build's hashed app.js; else it is fetched;
//   - caches are named after the site's folder URL and the version
//     ("fieldhead@<folder URL>#<version>"): activation deletes only this
//     site's older caches, never those of another copy on the same origin,
//     and the page can tell that a newer version took over (update.go).
const workerJS = `// Fieldhead service worker, version {{.Version}}.
const pageURL = new URL("./", self.location).href;
const cachePrefix = "fieldhead@" + pageURL + "#";
const cacheName = cachePrefix + "{{.Version}}";
const resourcesToCache = {{.ResourcesToCache}};

// Content-hashed names (internal/static): "app.0123456789.wasm".
const hashed = /\.[0-9a-f]{10}\.[A-Za-z0-9]+$/;

// fetchOK fetches url with the given cache mode, and past the HTTP cache
// if that gives no usable answer (say, an error a host let be cached).
async function fetchOK(url, mode) {
  let r = await fetch(url, { cache: mode });
  if (!r.ok) {
    r = await fetch(url, { cache: "reload" });
  }
  if (!r.ok) {
    throw new Error(url + ": " + r.status);
  }
  return r;
}

// installedPage is the page the visit loaded (a share link's URL is not
// pageURL, but the page is the same file), taken from the HTTP cache when
// it belongs to this build, else fetched.
async function installedPage() {
  const appJS = resourcesToCache.find((u) => /\/app\.[0-9a-f]{10}\.js$/.test(u));
  const seen = await self.clients.matchAll({ type: "window", includeUncontrolled: true });
  for (const client of seen) {
    if (!appJS || !client.url.startsWith(pageURL)) {
      continue;
    }
    try {
      const r = await fetch(client.url, { cache: "only-if-cached", mode: "same-origin" });
      if (r.ok && !r.redirected && (await r.clone().text()).includes('"' + appJS + '"')) {
        return r;
      }
    } catch (e) {
      // Not in the HTTP cache: fetch it below.
    }
  }
  return fetchOK(pageURL, "no-cache");
}

self.addEventListener("install", (event) => {
  event.waitUntil((async () => {
    const cache = await caches.open(cacheName);
    // The page is cached below; go-app lists it as "/" or, under a
    // sub-path, as the folder without its trailing slash.
    const isPage = (url) => [pageURL, pageURL.slice(0, -1)].includes(new URL(url, self.location).href);
    const files = resourcesToCache.filter((url) => !isPage(url));
    await Promise.all(files.map(async (url) => {
      const r = await fetchOK(url, hashed.test(url) ? "force-cache" : "no-cache");
      await cache.put(url, r);
    }));
    await cache.put(pageURL, await installedPage());
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
