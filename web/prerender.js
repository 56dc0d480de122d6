// Fieldhead: the page as written holds the demo sheet, drawn when the site
// was built, so that a first visit reads an answer before the wasm runs
// (app/loader.go). The wasm opens the link's sheet, else the one kept on
// this device, else the demo: so the demo is shown only on a bare link on a
// device with no kept sheet. Run before the page is drawn (a blocking
// script in <head>); without it the demo stays hidden.
try {
  if (location.search === "" && !localStorage.getItem("fieldhead.scenario")) {
    document.documentElement.classList.add("demo-page");
  }
} catch (e) {
  // storage blocked: keep the demo hidden
}
