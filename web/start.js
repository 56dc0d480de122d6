// Fieldhead: starts the worker that fetches and compiles the program, and
// is that worker. On the page (a document): an async script placed before
// the style sheets, fetched at high priority (the site writer puts it
// there, app/loader.go), that starts a worker from this same file as the
// page opens. It runs as soon as it is fetched and holds nothing back, so
// the worker is asked for, and on a first visit the wasm too (below),
// while the main thread is still free. Should app.js run first, it
// compiles on the page and this starts nothing (fieldheadCompileTaken).
//
// One file for both: the worker's script is then already in the browser's
// cache when the page starts it, where a file of its own was one more
// request on the link before the wasm's (make bench, a phone-class first
// visit: the worker's script came 340 ms after it was asked for, at
// 150 ms RTT).
//
// The worker fetches the wasm itself, so that the main thread stays free
// to lay out and paint what is shown before the program runs; app.js takes
// the module. Handing the worker the page's own response instead cost more
// than it saved: the page's main thread reading 9 MB (make bench, offline
// reload, about 250 ms more at 4× CPU). The worker's and the wasm's URLs
// are in <meta name="fieldhead-compile">, just before this script, renamed
// with every other reference when the site is written. Where no worker can
// be made, or it fails, app.js compiles on the page as go-app did.
//
// No preload of the wasm: the worker's fetch would join it in the browser's
// cache (one download), and on a phone-class first visit the answer came
// about 300 ms sooner; but the page reads what it preloads on its main
// thread, all at once on a fast link (a cold link on loopback 140 ms later)
// and from the service worker once the site is kept (an offline reload
// 100 ms later). The browser's estimate of the link cannot tell them apart
// on a first visit (headless Chromium on loopback: 1.3 Mbps, 100 ms).
"use strict";

// In the worker: compiles the program (app.wasm) off the page's main
// thread (app.js's fieldheadInstantiate, app/loader.go, starts the program
// from the module).
//
// The page names the wasm's URL, wasm_exec.js's and the query of the sheet
// it will open in the worker's name (JSON), read as this script first runs:
// a message from the page would arrive only once the page's busy main
// thread had seen the worker start. The compiled module goes back at once
// (shared with the page, not copied), or nothing if it cannot be fetched
// or compiled, and the page then compiles on its own thread instead (and
// says why it could not). Then the program's first steps run here once
// (its start, the sheet read, worked out and worded: app/warm.go): the
// browser compiles each function of a module when it is first called, on
// the thread that calls it, and the page's own start then finds most of
// them compiled.
if (typeof document === "undefined") {
  (async () => {
    let wasm, exec, query;
    try {
      ({ wasm, exec, query } = JSON.parse(self.name));
    } catch (err) {
      self.postMessage({ error: String(err) });
      self.close();
      return;
    }
    const response = fetch(wasm);
    response.then(() => self.postMessage({ joined: true }), () => {}); // the page lets its own request go
    const compiling = WebAssembly.compileStreaming(response);
    let ready = true; // wasm_exec.js read while the wasm streams in: the warm-up starts with no wait
    try {
      importScripts(exec);
    } catch (err) {
      ready = false;
    }
    let module;
    try {
      module = await compiling;
    } catch (err) {
      self.postMessage({ error: String(err) });
      self.close();
      return;
    }
    self.postMessage({ module });
    try {
      if (!ready) {
        throw new Error("no wasm_exec.js");
      }
      const go = new Go();
      self.fieldheadWarmQuery = query;
      await go.run(await WebAssembly.instantiate(module, go.importObject));
    } catch (err) {
      // Only a head start is lost.
    }
    self.close();
  })();
} else {
  (() => {
    const meta = document.querySelector('meta[name="fieldhead-compile"]');
    if (!meta || window.fieldheadCompileTaken || typeof Worker === "undefined" || !WebAssembly.compileStreaming ||
        new URLSearchParams(location.search).get("wasm") === "false") { // go-app's switch for no wasm
      return;
    }
    try {
      const url = meta.dataset.wasm;
      let query = location.search.slice(1);
      try {
        query = query || localStorage.getItem("fieldhead.scenario") || ""; // app/sheet.go storageKey
      } catch (e) {
        // No storage: the link's query, or the demo.
      }
      // On a first visit to a link the page asks for the wasm itself as
      // this script runs, and lets it go once the worker's own request has
      // joined the download in the browser's cache (the worker says so): a worker
      // starts only when the page's main thread is free to see it start,
      // which on a first visit comes after the page's first layout, 225–
      // 370 ms later (make bench, phone-class link, 4× CPU). The page never
      // reads what it fetched (reading 9 MB held its main thread for half a
      // second). A kept site is read from the service worker's cache, where
      // there is nothing to win. The bare page shows its written demo
      // until the program runs: the style sheets and the page have the
      // link to themselves (with the head start its written answer came
      // later: 1 628 ms against 1 340 on average over four alternated
      // phone-class rounds).
      let early = null;
      if (query !== "" && !(navigator.serviceWorker && navigator.serviceWorker.controller)) {
        early = new AbortController();
        fetch(url, {signal: early.signal}).catch(() => {}); // aborted, or failed: the worker's request says why
      }
      const letGo = () => early && early.abort();
      // The work goes in the worker's name, not in a message: a message to a
      // worker waits until the page's main thread has seen the worker start,
      // which, while it parses and lays out the page, came 70–220 ms after
      // the worker's script ran (make bench, cold share link, 4× CPU); the
      // name is there when it first runs. A cold link's answer 1 102 → 1 021
      // ms on average (five alternated rounds).
      const worker = new Worker(meta.content, {name: JSON.stringify({wasm: url, exec: meta.dataset.exec, query})});
      const module = new Promise((resolve) => {
        const done = (m) => { letGo(); resolve(m instanceof WebAssembly.Module ? m : null); };
        worker.onmessage = (e) => e.data && e.data.joined ? letGo() : done(e.data && e.data.module); // the worker then closes itself
        worker.onerror = (e) => { e.preventDefault(); worker.terminate(); done(null); };
        worker.onmessageerror = () => { worker.terminate(); done(null); };
      });
      window.fieldheadCompiling = {url, module};
    } catch (e) {
      // app.js compiles on the page.
    }
  })();
}
