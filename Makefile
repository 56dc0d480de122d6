# Fieldhead — build, serve, test and package the static site.
#
#   make run     build everything and serve it on http://localhost:8000/
#   make test    every check CI runs (installs missing Debian packages)
#   make dist    a static folder for any web host: make dist PREFIX=/tools/fieldhead
#   make refs    regenerate the reference tables in testdata/refs from Debian's libraries
#   make bench   measure the budgets of the product brief (table, then one JSON line)
#   make fuzz    run each fuzz target for FUZZTIME (part of make test)

SHELL  := /bin/bash
GO     ?= go
BUILD  := build
SITE   := $(BUILD)/site
WASM   := $(BUILD)/app.wasm
DIST   ?= dist
PREFIX ?=
ADDR   ?= :8000

# Debian packages the checks need: the browser for the page test (with
# poppler-utils and zbar-tools to read the printed record), the
# reference libraries for make refs and the reference checks.
APT_PKGS := chromium poppler-utils zbar-tools python3-iapws python3-mpmath python3-scipy python3-fluids python3-gsw python3-uncertainties units

.PHONY: all run site wasm dist test deps npm fmt vet unit fuzz browser bench refs refs-check clean

all: site

# The wasm is built without inlining (-gcflags=all=-l): the same code
# compresses far better (brotli about 195 KB smaller), for more Go time
# per edit. Inlining is kept in the runtime, Go's maps and syscall/js,
# where it buys the most time for the fewest bytes (an edit's Go phase
# 16.4 -> 13.5 ms at 4x CPU for 34 KB of brotli: app/internal/wasmflags,
# whose GC the tests and the bench build with and a test holds this to).
WASM_GCFLAGS := -gcflags=all=-l -gcflags=runtime= -gcflags=internal/runtime/maps= -gcflags=syscall/js=

wasm:
	@mkdir -p $(BUILD)
	GOOS=js GOARCH=wasm $(GO) build -trimpath -ldflags="-s -w" $(WASM_GCFLAGS) -o $(WASM) ./app

site: wasm
	$(GO) run ./app -out $(SITE) -wasm $(WASM) -prefix "$(PREFIX)"

run: wasm
	@echo "Fieldhead: open http://localhost$(ADDR)/ once the site is written"
	$(GO) run ./app -out $(SITE) -wasm $(WASM) -serve $(ADDR)

dist: wasm
	$(GO) run ./app -out $(DIST) -wasm $(WASM) -prefix "$(PREFIX)" -wasm-alias=false
	@echo "Fieldhead: copy the contents of $(DIST)/ to the folder your web server serves at $(if $(PREFIX),$(PREFIX)/,/)"

deps:
	@missing=""; \
	for p in $(APT_PKGS); do dpkg -s $$p >/dev/null 2>&1 || missing="$$missing $$p"; done; \
	command -v npm >/dev/null 2>&1 || missing="$$missing npm"; \
	if [ -n "$$missing" ]; then \
		echo "Installing Debian packages:$$missing"; \
		sudo=""; [ "$$(id -u)" -eq 0 ] || sudo=sudo; \
		$$sudo apt-get update && DEBIAN_FRONTEND=noninteractive $$sudo apt-get install -y$$missing; \
	fi

fmt:
	@bad="$$(gofmt -l app calc)"; if [ -n "$$bad" ]; then echo "gofmt needed:"; echo "$$bad"; exit 1; fi

vet:
	$(GO) vet ./...
	GOOS=js GOARCH=wasm $(GO) vet ./...

unit:
	$(GO) test $$($(GO) list ./... | grep -v '^fieldhead/app$$')

# The page checks' JavaScript tools (axe-core), exactly as
# app/testdata/package-lock.json pins them, into app/testdata/node_modules/
# (not in git). They live beside the tests that read them, in a testdata
# folder, which go list ./... (and so go vet and go test) never walks.
NPM_DIR := app/testdata

npm:
	npm ci --prefix $(NPM_DIR) --no-audit --no-fund

# The page checks take about 7 minutes on a quiet two-core machine; go
# test's default 10-minute limit was reached on a loaded one.
browser: site npm
	FIELDHEAD_BROWSER=1 FIELDHEAD_SITE="$(abspath $(SITE))" $(GO) test -count=1 -timeout 20m -v ./app

# Each fuzz target for a bounded time. A failing input is written under the
# package's testdata/fuzz/<target>/, where a plain go test replays it.
# Inputs are not minimised (-fuzzminimizetime 0): a minimisation that the
# time limit cuts short ends the run with "context deadline exceeded" and
# no failing input, which failed CI once for nothing.
FUZZTIME ?= 10s
FUZZ     := ./calc:FuzzParse ./calc:FuzzBalance ./calc/scenario:FuzzScenario ./calc/scenario:FuzzSheets ./calc/scenario:FuzzLinkDamage ./calc/scenario:FuzzParseRFC3339 ./calc/scenario/present:FuzzBuild

fuzz:
	@failed=""; for t in $(FUZZ); do \
		pkg=$${t%%:*}; name=$${t##*:}; \
		echo "== $$name in $$pkg for $(FUZZTIME)"; \
		run() { $(GO) test -run '^$$' -fuzz "^$$name\$$" -fuzztime $(FUZZTIME) -fuzzminimizetime 0 "$$pkg" 2>&1; }; \
		out="$$(run)"; rc=$$?; echo "$$out"; \
		if [ $$rc -ne 0 ] && echo "$$out" | grep -q 'context deadline exceeded' && ! echo "$$out" | grep -q 'Failing input written'; then \
			echo "(stopped at its deadline with no failing input, a fault of the fuzzer's shutdown: run once more)"; \
			run || failed="$$failed $$name"; \
		elif [ $$rc -ne 0 ]; then failed="$$failed $$name"; fi; \
	done; \
	if [ -n "$$failed" ]; then echo "fuzz targets failed:$$failed"; exit 1; fi

# The budgets of the product brief, measured in headless Chromium (4× CPU
# throttle) and by the calc benchmarks; the last line is the JSON summary.
bench: site
	$(GO) run ./app/internal/bench -site "$(SITE)"

# The committed reference tables must be exactly what the reference
# libraries produce.
refs-check: refs
	git diff --exit-code -- testdata

test: deps npm fmt vet unit refs-check fuzz browser

refs: deps
	@set -e; for f in testdata/refs/gen/*; do \
		case "$$f" in \
		*.py) echo "== $$f"; /usr/bin/python3 "$$f" ;; \
		*.sh) echo "== $$f"; bash "$$f" ;; \
		esac; \
	done

clean:
	rm -rf $(BUILD) $(DIST)
