// Fieldhead: compiles the program (app.wasm) off the page's main thread
// (web/start.js starts this worker; app.js's fieldheadInstantiate,
// app/loader.go, starts the program from the module).
//
// The page names the wasm's URL, wasm_exec.js's and the query of the sheet
// it will open in the worker's name (JSON), read as this script first runs:
// a message from the page would arrive only once the page's busy main
// thread had seen the worker start (web/start.js). The compiled module goes
// back at once (shared with the page, not copied), or nothing if it cannot
// be fetched or compiled, and the page then compiles on its own thread
// instead (and says why it could not). Then the program's first steps run
// here once (its start, the sheet read, worked out and worded:
// app/warm.go): the browser compiles each function of a module when it is
// first called, on the thread that calls it, and the page's own start then
// finds most of them compiled.
"use strict";
(async () => {
  let wasm, exec, query;
  try {
    ({ wasm, exec, query } = JSON.parse(self.name));
  } catch (err) {
    self.postMessage({ error: String(err) });
    self.close();
    return;
  }
  const compiling = WebAssembly.compileStreaming(fetch(wasm));
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
