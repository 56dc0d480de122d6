//go:build !wasm

package main

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"regexp"
)

// go-app's generated app.js loads the wasm, and two of its choices cost a
// phone a download and a compile on every visit. patchLoader changes just
// those, in the generated file, and fails the build if go-app's text is no
// longer what it expects:
//
//   - The wasm is compiled in a worker that fetches it itself (web/start.js,
//     which the page runs as it opens and which starts the worker from its
//     own file), and the page starts it from the compiled module
//     (instantiateJS): the main thread no longer reads and decodes 9 MB
//     while it lays out and paints. go-app wrapped the response in a new
//     Response to count bytes for a progress label; Chromium keeps
//     compiled code only for a module compiled from the fetched response
//     itself, so the worker compiles the response as fetched. The label
//     stays, without a percentage (newHandler's LoadingLabel).
//   - A mark, fieldhead-wasm-ready, once the module is instantiated (make bench).
//   - The service worker is registered once the wasm is running, not
//     before the download starts: its installation then takes every file
//     from the HTTP cache (worker.go) instead of downloading the site a
//     second time alongside the page on a slow link, and nothing the page
//     needs waits for it.
//   - A wasm that cannot be fetched or started (a first visit offline, a
//     download cut or blocked) is said in our words, the spinner stopped,
//     with a button that tries again (loadFailedJS); go-app wrote the
//     browser's own error ("TypeError: Failed to fetch") beside a spinner.
func patchLoader(js string) (string, error) {
	steps := []struct {
		what string
		re   *regexp.Regexp
		repl string
	}{
		{"the wasm's fetch and compile",
			regexp.MustCompile(`instantiateStreaming\(\s*fetchWithProgress\(("[^"]+"), showProgress\),\s*go\.importObject\s*\)`),
			`fieldheadInstantiate($1, go.importObject, instantiateStreaming)`},
		{"the service worker's registration before the wasm",
			regexp.MustCompile(`(?m)^goappInitServiceWorker\(\);\n`), ""},
		{"the start of the wasm",
			regexp.MustCompile(`(\n(\s*)go\.run\(wasm\.instance\);\n\s*loader\.remove\(\);\n)`),
			"\n${2}performance.mark(\"fieldhead-wasm-ready\"); // Fieldhead: compiled (make bench times the phases)${1}${2}goappInitServiceWorker(); // Fieldhead: after the wasm (loader.go)\n"},
		{"the failed start",
			regexp.MustCompile(`\} catch \(err\) \{\n(\s*)loaderIcon\.className = "goapp-logo";\n\s*loaderLabel\.innerText = err;\n(\s*console\.error\("loading wasm failed: ", err\);\n)`),
			"} catch (err) {\n${2}${1}fieldheadLoadFailed(loader, loaderIcon, loaderLabel); // Fieldhead: in our words, with a retry (loader.go)\n"},
	}
	for _, s := range steps {
		if n := len(s.re.FindAllStringIndex(js, -1)); n != 1 {
			return "", fmt.Errorf("patching go-app's app.js: %s found %d times, want once", s.what, n)
		}
		js = s.re.ReplaceAllString(js, s.repl)
	}
	return js + instantiateJS + loadFailedJS + buildJS, nil
}

// instantiateJS starts the wasm from the module web/start.js had a
// worker compile (web/start.js again, in the worker): the streamed
// compile's decoding then no longer holds the main thread, which meanwhile
// lays out and paints what the page shows before the wasm (about 200 ms of
// the main thread at 4× CPU on an offline reload, make bench). Where no
// worker was started, or it failed, the page compiles as go-app did, and a
// wasm that cannot be fetched fails there (loadFailedJS). A retry compiles
// on the page.
// window.fieldheadCompiledBy says which did ("worker" or "page").
const instantiateJS = `
// Fieldhead: the wasm compiled off the main thread (app/loader.go).
function fieldheadInstantiate(url, imports, onMain) {
  const here = () => { window.fieldheadCompiledBy = "page"; return onMain(fetch(url), imports); }; // for the browser tests
  const c = window.fieldheadCompiling;
  window.fieldheadCompiling = null; // a retry compiles on the page
  window.fieldheadCompileTaken = true; // web/start.js, should it run only now, starts no worker
  if (!c || c.url !== url) {
    return here();
  }
  return c.module.then((module) => {
    if (!module) {
      return here();
    }
    window.fieldheadCompiledBy = "worker";
    return WebAssembly.instantiate(module, imports).then((instance) => ({ module, instance }));
  });
}
`

// startCompileFirst puts, before the page's first style sheet, what starts
// the worker that compiles the wasm: <meta name="fieldhead-compile">
// naming the worker's script (web/start.js, which is both), the wasm and
// wasm_exec.js, then web/start.js, an async script that reads it. An async
// script runs as soon as it is fetched, whatever the style sheets, and
// blocks nothing: the worker is asked for, and on a first visit the wasm
// too, before the main thread gets busy laying out the page, and the
// download begins sooner than when prerender.js started it (make bench, a
// phone-class first visit: 7707–7899 → 7676–7774 ms; as a blocking script
// it held back the style sheets and the written answer by 200 ms). It is
// fetched at high priority (fetchpriority="high"): an async script is a
// low one, which Chromium holds back while the style sheets load, one low
// request at a time; on a slow link it would wait behind the manifest
// (on loopback the answer moved less than the noise: DEVELOPERS.md).
// app.js compiles on the page if it runs first (instantiateJS). The site
// writer renames every URL to its hashed name.
func startCompileFirst(page []byte, prefix string) ([]byte, error) {
	sheet := regexp.MustCompile(`<link [^>]*rel="stylesheet"[^>]*>`).FindIndex(page)
	if sheet == nil {
		return nil, errors.New("no style sheet to start the compiling worker before")
	}
	tags := `<meta name="fieldhead-compile" content="` + prefix + `/web/start.js" data-wasm="` + prefix + `/web/app.wasm" data-exec="` + prefix + `/wasm_exec.js">` +
		"\n    " + `<script async fetchpriority="high" src="` + prefix + `/web/start.js"></script>` + "\n    "
	return append(append(append([]byte{}, page[:sheet[0]]...), tags...), page[sheet[0]:]...), nil
}

// buildJS is goappBuild, which our go-app copy calls to build a new
// element's subtree in one call out of the wasm
// (app/third_party/go-app/pkg/app/mount_batch.go, which writes the buffer
// it reads): each call out of the wasm costs far more than the DOM work
// it asks for. A node is a kind byte (1 element, 2 element in a
// namespace, 3 text, 4 raw HTML), then its strings (a length as a
// little-endian base-128 number, then UTF-8); an element has its namespace
// (kind 2), tag, attribute count, names and values, and child count,
// followed by its children. Attributes are set as go-app's setJSAttribute
// sets them: a few as properties, the rest with setAttribute. It returns
// the nodes made, in the buffer's order.
const buildJS = `
// Fieldhead: a subtree built in one call from the wasm (app/loader.go).
function goappBuild(buf) {
  const dec = new TextDecoder();
  const nodes = [];
  let p = 0;
  const num = () => {
    let n = 0, shift = 0, b;
    do {
      b = buf[p++];
      n += (b & 127) * 2 ** shift;
      shift += 7;
    } while (b & 128);
    return n;
  };
  const str = () => {
    const n = num();
    const s = dec.decode(buf.subarray(p, p + n));
    p += n;
    return s;
  };
  const yes = (v) => /^(1|t|T|TRUE|true|True)$/.test(v); // Go's strconv.ParseBool; anything else is false
  const set = (el, name, value) => {
    switch (name) {
      case "value": el.value = value; break;
      case "contenteditable": el.contentEditable = value; break;
      case "ismap": el.isMap = yes(value); break;
      case "readonly": el.readOnly = yes(value); break;
      case "async": case "autofocus": case "autoplay": case "checked": case "default": case "defer":
      case "disabled": case "hidden": case "loop": case "multiple": case "muted": case "open":
      case "required": case "reversed": case "selected":
        el[name] = yes(value); break;
      default: el.setAttribute(name, value);
    }
  };
  const node = () => {
    const kind = buf[p++];
    if (kind === 3) {
      const t = document.createTextNode(str());
      nodes.push(t);
      return t;
    }
    if (kind === 4) {
      const wrapper = document.createElement("div");
      wrapper.innerHTML = str();
      const first = wrapper.firstChild;
      if (first) wrapper.removeChild(first);
      nodes.push(first);
      return first;
    }
    const ns = kind === 2 ? str() : "";
    const tag = str();
    const el = ns ? document.createElementNS(ns, tag) : document.createElement(tag);
    nodes.push(el);
    for (let n = num(); n > 0; n--) {
      const name = str();
      set(el, name, str());
    }
    for (let n = num(); n > 0; n--) {
      const child = node();
      if (child) el.appendChild(child);
    }
    return el;
  };
  node();
  return nodes;
}
`

// loadFailedJS ends app.js: what the corner note says, moved above the
// sheet, when the wasm could not be fetched or started. The written page
// stays as it is (the demo on a bare visit, readable; a link's sheet stays
// hidden, as no answer but the link's may show); a kept sheet's snapshot
// is painted whole (the cards it painted as their titles too:
// web/prerender.js whole); the note stops turning, says what happened and
// what to do, and its button runs go-app's start again without reloading
// the page (which, offline on a first visit, would show the browser's
// error page instead of the demo).
const loadFailedJS = `
// Fieldhead: the wasm did not load (app/loader.go).
function fieldheadLoadFailed(loader, icon, label) {
  const demo = document.documentElement.classList.contains("demo-page");
  const kept = document.documentElement.classList.contains("snap-page");
  const offline = navigator.onLine === false;
  if (kept && window.fieldheadSnapshot) {
    window.fieldheadSnapshot.whole(); // the cards past the first screen too: the sheet is all there is to read
  }
  loader.classList.add("failed");
  loader.setAttribute("role", "alert");
  document.body.prepend(loader); // above the sheet, in the page's flow: it covers nothing
  icon.className = "stopped";
  label.textContent = "Fieldhead could not start: " +
    (offline ? "this device is offline and has not kept the program yet. " : "its program did not download. ") +
    (demo ? "The demo sheet below can be read but not changed." :
      kept ? "The sheet below is as this device last showed it; it can be read but not changed." :
      "This link's sheet can be shown only once it starts.") +
    " Check the connection, then try again.";
  let retry = document.getElementById("app-wasm-retry");
  if (!retry) {
    retry = document.createElement("button");
    retry.type = "button";
    retry.id = "app-wasm-retry";
    retry.className = "act";
    retry.textContent = "Try again";
    retry.addEventListener("click", () => {
      retry.remove();
      loader.classList.remove("failed");
      loader.setAttribute("role", "status");
      icon.className = "goapp-spin";
      label.textContent = "Fieldhead is starting…";
      goappInitWebAssembly();
    });
    loader.append(retry);
  }
}
`

// patchLoaderHTML replaces go-app's loader, a full-window cover over the
// demo sheet the site writer drew (sheet.go), by a small polite status note
// of ours in a corner, with the ids app.js writes to. web/prerender.js, a
// blocking script in <head>, shows the demo only where the wasm will draw
// it too: a bare link on a device that keeps no sheet.
func patchLoaderHTML(page []byte) ([]byte, error) {
	loader := regexp.MustCompile(`(?s)<aside [^>]*id="app-wasm-loader"[^>]*>.*?</aside>`) // attributes in any order
	if n := len(loader.FindAllIndex(page, -1)); n != 1 {
		return nil, fmt.Errorf("patching go-app's page: its loader found %d times, want once", n)
	}
	return loader.ReplaceAll(page, []byte(`<div id="app-wasm-loader" role="status"><span id="app-wasm-loader-icon" class="goapp-spin"></span>`+
		`<span id="app-wasm-loader-label">Fieldhead is starting…</span></div>`)), nil
}

// patchSiteLoader applies patchLoader to the site's app.js.
func patchSiteLoader(out string) error {
	p := filepath.Join(out, "app.js")
	b, err := os.ReadFile(p)
	if err != nil {
		return err
	}
	js, err := patchLoader(string(b))
	if err != nil {
		return err
	}
	return os.WriteFile(p, []byte(js), 0o644)
}
