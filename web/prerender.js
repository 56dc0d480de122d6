// Fieldhead: what the page shows before the wasm runs. Run before the page
// is drawn (a blocking script in <head>, no inline script: CSP).
//
// The page as written holds the demo sheet, drawn when the site was built
// (app/loader.go). The wasm opens the link's sheet, else the one kept on
// this device, else the demo: so the demo is shown only on a bare link on a
// device with no kept sheet (.demo-page); without this script it stays
// hidden.
//
// The kept sheet: each time the page keeps a sheet (app/sheet.go, flush)
// it asks fieldheadSnapshot.take for a snapshot of the sheet as drawn, kept
// in localStorage under "fieldhead.snapshot." + the link's check (ck). On
// a later visit that opens that very sheet (its link, or a bare link on
// the device keeping it) the snapshot is painted in place of the written
// demo (.snap-page), inert, until the wasm draws the live sheet over it.
// No other link ever shows it: the link to be opened must equal the link
// the snapshot was taken of, character for character. The cards that
// started past the first screen and a half when it was taken are painted
// as their titles (.snap-cut) until the live sheet comes, and whole only
// if the program cannot start (whole, from app.js: app/loader.go).
//
// Nothing in a snapshot can run. It is kept as data, never as HTML: a tree
// of [tag, {attribute: value}, child…] and strings (text). Painting builds
// it with createElement, setAttribute and text nodes only (never innerHTML
// or a parser), and only for the tags and attributes of the lists below,
// both at taking and at painting: no script, style, link, iframe, object,
// form or foreignObject element (a field's form is taken as a div), no
// attribute named on…, no style, href, src or action; an element not
// listed is left out with what it holds.
// Every element of it is inert (no focus, no click) and the page's CSP
// (self only, no inline script or style) stays as it is.
(() => {
  const KEY = "fieldhead.scenario"; // app/sheet.go storageKey
  const PREFIX = "fieldhead.snapshot.";
  const SVG = "http://www.w3.org/2000/svg";
  const TAGS = new Set(("div span p h1 h2 h3 h4 strong em b i small sub sup br hr ul ol li dl dt dd " +
    "table caption thead tbody tfoot tr th td colgroup col header nav main section footer aside figure figcaption " +
    "label input select option optgroup textarea button output fieldset legend details summary abbr code kbd a " +
    "svg g path line polyline polygon rect circle ellipse text tspan title desc defs pattern clipPath marker " +
    "linearGradient stop").split(" "));
  const ATTRS = new Set(("class id role type value checked selected disabled readonly placeholder inputmode " +
    "for colspan rowspan scope lang dir title hidden open min max step maxlength size rows cols elementtiming " +
    "viewBox width height x y x1 y1 x2 y2 cx cy r rx ry d points transform fill stroke stroke-width " +
    "stroke-dasharray stroke-dashoffset stroke-linecap stroke-linejoin stroke-opacity opacity fill-opacity " +
    "text-anchor dominant-baseline font-size font-weight font-style letter-spacing patternUnits " +
    "patternTransform preserveAspectRatio focusable clip-path marker-start marker-end marker-mid markerWidth " +
    "markerHeight refX refY orient vector-effect paint-order offset stop-color").split(" "));
  const allowed = (name) => ATTRS.has(name) || /^(aria|data)-[a-z0-9-]+$/.test(name);

  // take keeps a snapshot of #sheet as drawn now for query, the kept
  // sheet's link, and drops any other snapshot.
  const take = (query) => {
    try {
      const root = document.getElementById("sheet");
      const ck = new URLSearchParams(query).get("ck");
      if (!root || !ck || root.classList.contains("prerendered")) return;
      // Not while the live sheet still holds a card's place or a card lent
      // from the snapshot (lend): it is taken once drawn whole.
      if (root.querySelector(".card-later, .snap-cut")) return;
      // later names the cards a return visit need not paint whole at
      // first: those that start past the first screen and a half and are
      // not on the screen shown now (a reload keeps its place).
      const later = [];
      const scrolled = window.scrollY;
      const first = (el) => {
        const r = el.getBoundingClientRect();
        return r.top + scrolled < 1.5 * window.innerHeight || (r.bottom > 0 && r.top < window.innerHeight);
      };
      const walk = (el) => {
        // A field's form (app/el.go formBody) is taken as a div, which
        // lays out as the form does: no form is ever painted.
        const tag = el.localName === "form" ? "div" : el.localName;
        if (!TAGS.has(tag) || el.classList.contains("print-only")) return null;
        const attrs = {};
        for (const a of el.attributes) {
          if (allowed(a.name)) attrs[a.name] = a.value;
        }
        if (tag === "section" && el.classList.contains("card") && el.id && !first(el)) later.push(el.id);
        // A box shows what is typed, not its attribute.
        if (tag === "input") {
          if (el.type === "checkbox" || el.type === "radio") {
            if (el.checked) attrs.checked = ""; else delete attrs.checked;
          } else {
            attrs.value = el.value;
          }
        }
        if (tag === "option") {
          if (el.selected) attrs.selected = ""; else delete attrs.selected;
        }
        const node = [tag, attrs];
        if (tag === "textarea") {
          node.push(el.value);
          return node;
        }
        for (const c of el.childNodes) {
          if (c.nodeType === 3) node.push(c.data);
          else if (c.nodeType === 1) {
            const n = walk(c);
            if (n) node.push(n);
          }
        }
        return node;
      };
      const snap = JSON.stringify({q: query, root: walk(root), later});
      for (let i = localStorage.length - 1; i >= 0; i--) {
        const k = localStorage.key(i);
        if (k && k.startsWith(PREFIX) && k !== PREFIX + ck) localStorage.removeItem(k);
      }
      localStorage.setItem(PREFIX + ck, snap);
    } catch (e) {
      // storage full or blocked: the next visit waits for the wasm
    }
  };

  // cut holds the cards painted as their title only (.snap-cut), each
  // with its node: whole paints them whole.
  const cut = new Map();

  // build makes the DOM of a snapshot's node, or null for one not allowed.
  // A card named in later is built as its title only: the browser lays
  // out and paints the snapshot before anything else, text it has not
  // shaped yet, which at 4× CPU took about 240 ms for the whole Balance
  // view on a new visit (make bench, -return-only -trace), and the live
  // card replaces it a moment after the wasm runs.
  const build = (node, svg, later) => {
    if (typeof node === "string") return document.createTextNode(node);
    if (!Array.isArray(node) || typeof node[0] !== "string" || !TAGS.has(node[0])) return null;
    const tag = node[0];
    const inSVG = svg || tag === "svg";
    const el = inSVG ? document.createElementNS(SVG, tag) : document.createElement(tag);
    const attrs = node[1] && typeof node[1] === "object" ? node[1] : {};
    for (const name of Object.keys(attrs)) {
      if (!allowed(name) || typeof attrs[name] !== "string") continue;
      // The snapshot's answer is timed apart from the written page's (make bench).
      el.setAttribute(name, name === "elementtiming" ? "snapshot-" + attrs[name] : attrs[name]);
    }
    if (later && tag === "section" && later.has(attrs.id)) {
      cut.set(el, node);
      el.classList.add("snap-cut");
      const title = titleOf(node);
      if (title) el.appendChild(build(title, false, null));
      return el;
    }
    for (let i = 2; i < node.length; i++) {
      const c = build(node[i], inSVG, later);
      if (c) el.appendChild(c);
    }
    if (tag === "textarea") el.value = el.textContent;
    return el;
  };

  // titleOf finds a card's first h2, or null.
  const titleOf = (node) => {
    for (let i = 2; i < node.length; i++) {
      const c = node[i];
      if (!Array.isArray(c)) continue;
      if (c[0] === "h2") return c;
      const t = titleOf(c);
      if (t) return t;
    }
    return null;
  };

  // whole paints the cards painted as their title whole, inert: when the
  // program cannot start, the kept sheet is all there is to read.
  const whole = () => {
    try {
      for (const [el, node] of cut) {
        const full = build(node, false, null); // a section: always built
        full.setAttribute("inert", "");
        el.replaceWith(full);
      }
      cut.clear();
    } catch (e) {
      // the titles stay
    }
  };

  // paint draws the snapshot's sheet into sheet, every part of it inert
  // but main and its h1 (the landmarks the written page keeps too).
  const paint = (root, sheet, later) => {
    const cls = root[1] && typeof root[1].class === "string" ? root[1].class : "sheet";
    const kids = [];
    for (let i = 2; i < root.length; i++) {
      const c = build(root[i], false, later);
      if (!c) continue;
      if (c.nodeType === 1 && c.localName === "main") {
        for (const m of c.children) {
          if (m.localName !== "h1") m.setAttribute("inert", "");
        }
      } else if (c.nodeType === 1) {
        c.setAttribute("inert", "");
      }
      kids.push(c);
    }
    sheet.replaceChildren(...kids);
    sheet.setAttribute("class", cls + " prerendered snapshot");
    performance.mark("fieldhead-snapshot"); // make bench: where the time before it went
  };

  // shown is the sheet the page shows before the wasm runs, the written
  // demo or the snapshot: only ever the sheet the wasm will open.
  let shown = null;

  // lend moves into the live sheet's first draw, in each place a card was
  // put off (.card-later, app/sheet.go), that card as shown before the
  // wasm ran, inert, until the live card takes its place a frame or two
  // later; the sheet shown is off the page by then (the wasm mounted over
  // it), so no id is on the page twice.
  const lend = () => {
    try {
      const live = document.getElementById("sheet");
      if (!shown || !live || live === shown || shown.isConnected) return;
      const cards = new Map();
      for (const c of shown.querySelectorAll("section.card[id]")) cards.set(c.id, c);
      for (const slot of live.querySelectorAll(".card-later[data-card]")) {
        const c = cards.get(slot.getAttribute("data-card"));
        if (c && slot.childElementCount === 0) {
          c.setAttribute("inert", "");
          slot.appendChild(c);
        }
      }
      shown = null;
    } catch (e) {
      // the places stay empty until the live cards are drawn
    }
  };

  window.fieldheadSnapshot = {take, lend, whole};

  try {
    const query = location.search.slice(1) || localStorage.getItem(KEY) || "";
    if (query === "") {
      document.documentElement.classList.add("demo-page");
      document.addEventListener("DOMContentLoaded", () => { shown = document.getElementById("sheet"); }, {once: true});
      return;
    }
    // Not the written demo: the first paint (the kept sheet's snapshot, or
    // the starting note) waits for nothing in it (app/native.go).
    const expect = document.querySelector('link[rel="expect"]');
    if (expect) expect.remove();
    const ck = new URLSearchParams(query).get("ck");
    const raw = ck ? localStorage.getItem(PREFIX + ck) : null;
    if (!raw) return;
    const snap = JSON.parse(raw);
    if (!snap || snap.q !== query || !Array.isArray(snap.root)) return; // another link: never shown
    // The written demo is not laid out meanwhile (fieldhead.css).
    document.documentElement.classList.add("snap-page");
    // As soon as the parser opens the written sheet, not once it has read
    // it: the snapshot takes its place (its id and classes) in a sheet of
    // its own just before it, so that the browser's first paint shows it;
    // the parser goes on filling the written sheet, set aside and hidden,
    // which is dropped once read (the starting note follows it), before
    // the wasm mounts on the body's first element.
    let written = null;
    const early = () => {
      if (written) return;
      const el = document.getElementById("sheet");
      if (!el || !el.classList.contains("prerendered") || !el.parentNode) return;
      written = el;
      const box = document.createElement("div");
      box.id = "sheet";
      el.removeAttribute("id");
      el.parentNode.insertBefore(box, el);
      paint(snap.root, box, new Set(Array.isArray(snap.later) ? snap.later : []));
      shown = box;
    };
    const done = () => {
      early();
      mo.disconnect();
      if (written) written.remove();
    };
    const mo = new MutationObserver(() => {
      early();
      if (document.getElementById("app-wasm-loader")) done();
    });
    mo.observe(document.documentElement, {childList: true, subtree: true});
    document.addEventListener("DOMContentLoaded", done, {once: true});
  } catch (e) {
    // storage blocked or a snapshot unreadable: the written page as it was
  }
})();
