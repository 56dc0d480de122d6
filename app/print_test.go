//go:build !wasm

package main

import (
	"cmp"
	"fmt"
	"math"
	"net/http/httptest"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"slices"
	"strconv"
	"strings"
	"testing"
	"time"
	"unicode"

	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"

	"fieldhead/calc/scenario"
)

// The printed record: what "Print sheet" puts on paper.

// printMeasureJS measures the Report as laid out in print media at the
// printable width: each chart drawn (its width against the sheet's, its
// smallest text in pt: the font size in viewBox units times the drawn
// width over the viewBox width, 0.75 pt a CSS px, CSS 2.1 §4.3.2), the
// text of each block that must not be parted by a page, with its height,
// and the whole document's height.
const printMeasureJS = `(() => {
  const vis = (e) => e.getClientRects().length > 0;
  const sheet = document.getElementById("sheet").getBoundingClientRect().width;
  const charts = [...document.querySelectorAll(".report .chart svg")].filter(vis).map((svg) => {
    const w = svg.getBoundingClientRect().width, vb = svg.viewBox.baseVal.width;
    let least = 1e9;
    for (const t of svg.querySelectorAll("text")) {
      if (!vis(t)) continue;
      least = Math.min(least, parseFloat(getComputedStyle(t).fontSize) * w / vb * 0.75);
    }
    const fig = svg.closest("figure");
    // the headings just before a chart are kept with it (break-after:
    // avoid), and so are those of each section the chart opens (a card's
    // title above its first chart)
    const lead = (el) => {
      let h = el;
      for (let e = el.previousElementSibling; e && (/^H[1-6]$/.test(e.tagName) || !vis(e)); e = e.previousElementSibling) {
        if (vis(e)) h = e;
      }
      return h;
    };
    const report = fig.closest(".report");
    let head = lead(fig);
    while (head.parentElement && head.parentElement !== report && report.contains(head.parentElement) &&
      [...head.parentElement.children].find(vis) === head) {
      head = lead(head.parentElement);
    }
    const texts = [...svg.querySelectorAll("text")].map((t) => t.textContent).filter((s) => s.trim().length > 3);
    return {id: fig ? fig.id : "", width: w, sheet: sheet, leastPt: least,
      top: head.getBoundingClientRect().top, height: fig.getBoundingClientRect().bottom - head.getBoundingClientRect().top,
      first: texts[0] || "", caption: fig && fig.querySelector(".caption") ? fig.querySelector(".caption").innerText : ""};
  });
  const sel = ".report dl.facts, .report .grid tbody tr, .report .level, .report .warnbox li, #signoff .signrow, .linkwords";
  const blocks = [...document.querySelectorAll(sel)].filter(vis).map((e) => ({
    what: e.tagName.toLowerCase() + (e.id ? "#" + e.id : "") + (e.className ? "." + String(e.className).split(" ")[0] : ""),
    text: e.innerText, top: e.getBoundingClientRect().top, height: e.getBoundingClientRect().height}));
  return {charts: charts, blocks: blocks, height: document.documentElement.scrollHeight,
    qr: !!document.querySelector(".report .qrbox svg") && vis(document.querySelector(".report .qrbox svg")),
    short: vis(document.getElementById("report-short-url")), long: vis(document.getElementById("report-url")),
    sign: document.querySelectorAll("#signoff .signline").length};
})()`

// printedTestJS counts, on the Report in print media, what a test at
// several flows must print: its pump chart with the tested curve shown,
// the band's edges, the readings (each in its box), the tolerance cross
// and the origin line; the test table and the guarantee verdict shown.
const printedTestJS = `(() => {
  const svg = [...document.querySelectorAll(".report .chart svg")].find((s) => s.getClientRects().length > 0 && s.querySelector('[data-series="tested"]'));
  const n = (sel) => svg ? svg.querySelectorAll(sel).length : 0;
  const shown = (id) => { const e = document.getElementById(id); return e && e.closest(".report") !== null && e.getClientRects().length > 0 ? 1 : 0; };
  return [svg && svg.getClientRects().length > 0 ? 1 : 0, n('[data-series="tested-band"]'), n('[data-mark="measured"]'), n('[data-series="cross"]'),
    n('[data-series="origin-line"]'), shown("test-table"), shown("guarantee-level")].join(" ");
})()`

// printedTestWant is printedTestJS's answer for the pump-test demo: the
// chart shown, two band edges, five readings, one cross, one origin line,
// the table and the verdict shown.
const printedTestWant = "1 2 5 1 1 1 1"

type printMeasure struct {
	Charts []struct {
		ID, First, Caption                 string
		Width, Sheet, LeastPt, Top, Height float64
	}
	Blocks []struct {
		What, Text  string
		Top, Height float64
	}
	Height    float64
	QR, Short bool
	Long      bool
	Sign      int
}

// squeeze is text as compared between the page and the PDF: no white
// space, no hyphens (a printed line may hyphenate a word), lower case.
func squeeze(s string) string {
	return strings.Map(func(r rune) rune {
		if unicode.IsSpace(r) || r == '-' || r == '\u00ad' || r == '\u2010' || r == '\u200b' {
			return -1
		}
		return unicode.ToLower(r)
	}, s)
}

// pdfPages is the text of each page of a PDF, in the order it was drawn
// (poppler's pdftotext -raw), and how far down each page its last text
// reaches, as a share of the page's height (pdftotext -bbox).
func pdfPages(t *testing.T, pdf string) (pages []string, bottom []float64) {
	t.Helper()
	out, err := exec.Command("pdftotext", "-raw", "-enc", "UTF-8", pdf, "-").Output()
	if err != nil {
		t.Fatalf("pdftotext: %v", err)
	}
	pages = strings.Split(strings.TrimSuffix(string(out), "\f"), "\f")
	box, err := exec.Command("pdftotext", "-bbox", pdf, "-").Output()
	if err != nil {
		t.Fatalf("pdftotext -bbox: %v", err)
	}
	pageRe := regexp.MustCompile(`<page width="([0-9.]+)" height="([0-9.]+)">`)
	wordRe := regexp.MustCompile(`yMax="([0-9.]+)"`)
	for _, part := range strings.Split(string(box), "</page>") {
		m := pageRe.FindStringSubmatch(part)
		if m == nil {
			continue
		}
		h, _ := strconv.ParseFloat(m[2], 64)
		low := 0.0
		for _, w := range wordRe.FindAllStringSubmatch(part, -1) {
			y, _ := strconv.ParseFloat(w[1], 64)
			low = math.Max(low, y)
		}
		bottom = append(bottom, low/h)
	}
	return pages, bottom
}

// TestPrintRecord prints both demos and the pump-test demo (five
// readings: its tested curve, band, cross and verdict, printedTestJS),
// from the view each opens on, with
// "Print sheet" (the browser's dialog stood in for: the page is printed to
// PDF while the dialog would be open) on A4 and Letter, and checks the
// record: the Report is what prints, the view comes back afterwards; each
// chart at the text width with its smallest text at least 8 pt on paper;
// the link as a QR code beside its short form, not the whole link; the
// signature block; no result block, table row, verdict, warning, chart
// or signature row parted by a page (its text whole on one page of the
// PDF); no page but the last less than half filled unless what follows
// could not fit; and no more pages than the sheet's height needs, plus one
// for the blocks kept whole.
// isoStamp is the printed date's form (nowText).
var isoStamp = regexp.MustCompile(`^\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC[+-]\d{2}:\d{2}$`)

func TestPrintRecord(t *testing.T) {
	if _, err := exec.LookPath("pdftotext"); err != nil {
		needBrowser(t, "pdftotext not found: apt-get install poppler-utils")
	}
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)
	for _, demo := range []struct {
		name, view string
		sc         scenario.Scenario
		charts     int
	}{{"demo", "pump", scenario.Demo(), 2}, {"turbine-demo", "line", scenario.TurbineDemo(), 1}, {"pumptest-demo", "pump", scenario.PumpTestDemo(), 2}} {
		for _, paper := range papers {
			where := demo.name + " on " + paper.name
			sc := demo.sc.Clone()
			_ = sc.Set("view", demo.view)
			if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(1024, 768)); err != nil {
				t.Fatal(err)
			}
			b.navigate(srv.URL + "/?" + sc.Encode())
			b.js(`(() => { window.fieldheadPrinted = ""; window.print = () => { window.fieldheadPrinted = document.getElementById("sheet").className; }; return ""; })()`)
			// The live button, not a written or kept copy's inert one; a
			// click that lands while the page is still being drawn is
			// tried once more.
			b.poll(`(() => { const e = document.querySelector("#print"); return !!e && !e.closest("[inert]"); })()`, 10*time.Second)
			printed := false
			for try := 0; try < 2 && !printed; try++ {
				if err := clickID(b, "print"); err != nil {
					t.Fatal(err)
				}
				printed = b.poll(`window.fieldheadPrinted !== ""`, 10*time.Second)
			}
			if !printed {
				t.Fatalf("%s: Print sheet did not open the print dialog", where)
			}
			if got := b.js(`window.fieldheadPrinted`); !strings.Contains(got, "view-report") {
				t.Errorf("%s: Print sheet from the %s view printed %q, not the Report", where, demo.view, got)
			}

			if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{Media: "print"}); err != nil {
				t.Fatal(err)
			}
			if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(int64(paper.printableCSSp), 1000)); err != nil {
				t.Fatal(err)
			}
			time.Sleep(300 * time.Millisecond) // a resize redraws the screen's charts
			m, err := chromedp.Run(b.ctx, chromedp.Evaluate[printMeasure](printMeasureJS))
			if err != nil {
				t.Fatal(err)
			}
			if len(m.Charts) != demo.charts {
				t.Errorf("%s: %d charts print, want %d", where, len(m.Charts), demo.charts)
			}
			for _, c := range m.Charts {
				if c.Width < 0.98*c.Sheet {
					t.Errorf("%s: chart %s prints %.0f px wide, the text width is %.0f px", where, c.ID, c.Width, c.Sheet)
				}
				if c.LeastPt < 8 {
					t.Errorf("%s: chart %s has text of %.1f pt on paper, want at least 8 pt", where, c.ID, c.LeastPt)
				}
				t.Logf("%s: chart %s %.0f mm wide, %.0f mm tall with its heading and caption, smallest text %.1f pt", where, c.ID, c.Width*25.4/96, c.Height*25.4/96, c.LeastPt)
			}
			if got := b.js(printedTestJS); demo.name == "pumptest-demo" && got != printedTestWant {
				t.Errorf("%s: the printed tested chart, band edges, readings, cross, origin line, test table and verdict count %q, want %q", where, got, printedTestWant)
			}
			if !m.QR || !m.Short || m.Long {
				t.Errorf("%s: the link prints as QR code %v, short form %v, whole %v; want the code and the short form", where, m.QR, m.Short, m.Long)
			}
			if m.Sign != 6 {
				t.Errorf("%s: %d lines to sign on, want name, signature and date for the tester and the witness", where, m.Sign)
			}
			// The date printed is ISO 8601's calendar date and time of day
			// with its offset from UTC (ISO 8601-1:2019, 5.3.4): a locale's
			// "12/5/2026" reads as 12 May in some places.
			if got := b.js(`document.getElementById("report-date").textContent`); !isoStamp.MatchString(got) {
				t.Errorf("%s: the report is dated %q, want YYYY-MM-DD hh:mm UTC±hh:mm", where, got)
			}
			if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{}); err != nil {
				t.Fatal(err)
			}
			if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(1024, 768)); err != nil {
				t.Fatal(err)
			}

			// Printing fires afterprint, which brings the view back: the
			// link is read before.
			short, link := b.js(`document.getElementById("report-short-url").textContent`), b.js(`document.getElementById("report-url").textContent`)
			pdf, err := chromedp.Run(b.ctx, chromedp.PrintToPDF(func(p *page.PrintToPDFParams) {
				p.PaperWidth, p.PaperHeight = paper.wMM/25.4, paper.hMM/25.4
			}))
			if err != nil {
				t.Fatalf("%s: printing to PDF: %v", where, err)
			}
			checkPDF(t, where, pdf, paper.wMM, paper.hMM)
			file := filepath.Join(b.shots, fmt.Sprintf("record-%s-%s.pdf", demo.name, paper.name))
			if err := os.WriteFile(file, pdf, 0o644); err != nil {
				t.Fatal(err)
			}
			pages, bottom := pdfPages(t, file)
			sq := make([]string, len(pages))
			for i, p := range pages {
				sq[i] = squeeze(p)
			}
			onPage := func(s string) int {
				for i, p := range sq {
					if strings.Contains(p, s) {
						return i
					}
				}
				return -1
			}
			// Each kept block and chart: the page it starts on, its height.
			type kept struct {
				what        string
				page        int
				top, height float64
			}
			var all []kept
			for _, bl := range m.Blocks {
				s := squeeze(bl.Text)
				if s == "" {
					continue
				}
				p := onPage(s)
				if p < 0 {
					t.Errorf("%s: %s is not whole on any page (parted by a page?): %.120q", where, bl.What, bl.Text)
					continue
				}
				all = append(all, kept{bl.What, p, bl.Top, bl.Height})
			}
			for _, c := range m.Charts {
				first, last := onPage(squeeze(c.First)), onPage(squeeze(c.Caption))
				if first < 0 || first != last {
					t.Errorf("%s: chart %s begins on page %d and its caption is on page %d", where, c.ID, first+1, last+1)
				}
				all = append(all, kept{"chart " + c.ID, first, c.Top, c.Height})
			}
			slices.SortFunc(all, func(a, b kept) int { return cmp.Compare(a.top, b.top) })
			t.Logf("%s: %d blocks and charts checked whole on a page", where, len(all))
			pageH := (paper.hMM - 2*14) / 25.4 * 96
			if limit := int(math.Ceil(m.Height/pageH)) + 1; len(pages) > limit {
				t.Errorf("%s: %d pages for a sheet %.0f px tall in print (%.1f pages of %.0f px)", where, len(pages), m.Height, m.Height/pageH, pageH)
			}
			// A page less than half filled is allowed only when the block
			// that starts the next page would not have fitted in its rest.
			// The fill is read off the page's lowest text, so the rest is
			// taken less a line (24 px) for what lies under that text: a
			// row's padding and rule, a block's margin.
			for i := 0; i+1 < len(bottom); i++ {
				fill := (bottom[i] - 14/paper.hMM) / (1 - 28/paper.hMM)
				if fill >= 0.5 {
					continue
				}
				next := -1
				for j, k := range all {
					if k.page == i+1 {
						next = j
						break
					}
				}
				if free := (1-fill)*pageH - 24; next < 0 || all[next].height < free {
					what := "nothing kept whole"
					if next >= 0 {
						what = fmt.Sprintf("%s, %.0f px tall", all[next].what, all[next].height)
					}
					t.Errorf("%s: page %d of %d is %.0f %% filled; the next page starts with %s, and %.0f px were free", where, i+1, len(bottom), fill*100, what, free)
				}
			}
			// The code as printed, read off the page at 150 dpi (a module
			// is then about 2.6 px) by ZBar's zbarimg, is the sheet's link.
			if zbar, err := exec.LookPath("zbarimg"); err != nil {
				needBrowser(t, "zbarimg not found: apt-get install zbar-tools")
			} else if p := onPage(squeeze(short)); p < 0 {
				t.Errorf("%s: the short link is not on any page", where)
			} else {
				img := filepath.Join(t.TempDir(), "page")
				n := strconv.Itoa(p + 1)
				if out, err := exec.Command("pdftoppm", "-r", "150", "-png", "-singlefile", "-f", n, "-l", n, file, img).CombinedOutput(); err != nil {
					t.Fatalf("pdftoppm: %v %s", err, out)
				}
				got, err := exec.Command(zbar, "--raw", "-q", "-Sdisable", "-Sqrcode.enable", "-Sbinary", img+".png").Output()
				if want := link; err != nil || strings.TrimSuffix(string(got), "\n") != want {
					t.Errorf("%s: the printed code reads %q (%v), want the link %q", where, got, err, want)
				}
			}
			if demo.name == "pumptest-demo" {
				// The verdict and every reading's row print whole (the
				// blocks above), and the tested curve's caption with them.
				for _, id := range []string{"guarantee-level", "test-table"} {
					if txt := b.js(`(document.getElementById("` + id + `") || {}).innerText || ""`); txt == "" || onPage(squeeze(strings.SplitN(txt, "\n", 2)[0])) < 0 {
						t.Errorf("%s: #%s is not printed (%.80q)", where, id, txt)
					}
				}
			}
			t.Logf("%s: %d pages (sheet %.1f pages tall), filled %v", where, len(pages), m.Height/pageH, bottom)

			if !b.poll(`document.getElementById("sheet").classList.contains("view-`+demo.view+`")`, 10*time.Second) {
				t.Errorf("%s: the %s view did not come back after printing", where, demo.view)
			}
		}
	}
	b.noProblems("printing the record")
}
