// Fieldhead: starts the worker that fetches and compiles the program
// (web/compile.js) as the page opens. An async script placed before the
// style sheets, fetched at high priority (the site writer puts it there,
// app/loader.go): it runs as soon as it is fetched and holds nothing
// back, so the worker's download of the wasm starts while the main thread
// is still free (the worker cannot start while it is busy). Should app.js
// run first, it compiles on the page and this starts nothing
// (fieldheadCompileTaken).
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
    // The work goes in the worker's name, not in a message: a message to a
    // worker waits until the page's main thread has seen the worker start,
    // which, while it parses and lays out the page, came 70–220 ms after
    // the worker's script ran (make bench, cold share link, 4× CPU); the
    // name is there when it first runs. A cold link's answer 1 102 → 1 021
    // ms on average (five alternated rounds).
    const worker = new Worker(meta.content, {name: JSON.stringify({wasm: url, exec: meta.dataset.exec, query})});
    const module = new Promise((resolve) => {
      const done = (m) => resolve(m instanceof WebAssembly.Module ? m : null);
      worker.onmessage = (e) => done(e.data && e.data.module); // the worker then closes itself
      worker.onerror = (e) => { e.preventDefault(); worker.terminate(); done(null); };
      worker.onmessageerror = () => { worker.terminate(); done(null); };
    });
    window.fieldheadCompiling = {url, module};
  } catch (e) {
    // app.js compiles on the page.
  }
})();
