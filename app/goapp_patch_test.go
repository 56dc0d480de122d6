//go:build !wasm

package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"io/fs"
	"os"
	"os/exec"
	"path/filepath"
	"sort"
	"strings"
	"testing"
)

// The go-app copy in app/third_party/go-app differs from the upstream
// release only by app/third_party/go-app.diff (why: app/third_party/README.md).
// It is a module of its own, so `go vet ./...` and `go test ./...` leave it
// alone; go.mod's replace points at it.

const (
	goappModule  = "github.com/maxence-charriere/go-app/v10"
	goappVersion = "v10.1.11"
	// goappSum is the module checksum of the release as this project's
	// go.sum held it before the copy replaced it (and as the checksum
	// database records it): the upstream compared against is the real one.
	goappSum = "h1:4JUSlVQ8zVIeL3acFJEpuerP6FLoEQWg6CUTtHcz7Ro="
)

// goappCarried is the part of the module the copy carries: its go.mod,
// licence and the two packages Fieldhead imports, without their tests.
func goappCarried(rel string) bool {
	rel = filepath.ToSlash(rel)
	if rel == "go.mod" || rel == "LICENSE" {
		return true
	}
	for _, pkg := range []string{"pkg/app/", "pkg/errors/"} {
		if name, ok := strings.CutPrefix(rel, pkg); ok && !strings.Contains(name, "/") {
			return !strings.HasSuffix(name, "_test.go")
		}
	}
	return false
}

// carriedFiles lists the carried files under root, relative, sorted.
func carriedFiles(root string) (map[string]bool, error) {
	files := map[string]bool{}
	err := filepath.WalkDir(root, func(p string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() {
			return err
		}
		rel, err := filepath.Rel(root, p)
		if err == nil && goappCarried(rel) {
			files[filepath.ToSlash(rel)] = true
		}
		return err
	})
	return files, err
}

// goappDiff is the unified diff, file by file, from upstream to ours.
func goappDiff(upstream, ours string) (string, error) {
	up, err := carriedFiles(upstream)
	if err != nil {
		return "", err
	}
	my, err := carriedFiles(ours)
	if err != nil {
		return "", err
	}
	var all []string
	for f := range up {
		all = append(all, f)
	}
	for f := range my {
		if !up[f] {
			all = append(all, f)
		}
	}
	sort.Strings(all)
	var out bytes.Buffer
	for _, f := range all {
		a, b := filepath.Join(upstream, f), filepath.Join(ours, f)
		la, lb := "a/"+f, "b/"+f
		if !up[f] {
			a, la = os.DevNull, "/dev/null"
		}
		if !my[f] {
			b, lb = os.DevNull, "/dev/null"
		}
		cmd := exec.Command("diff", "-u", "--label", la, "--label", lb, a, b)
		d, err := cmd.Output()
		var exit *exec.ExitError
		if err != nil && !(errors.As(err, &exit) && exit.ExitCode() == 1) {
			return "", err
		}
		out.Write(d)
	}
	return out.String(), nil
}

// TestGoAppPatch: the go-app module Fieldhead builds with (go.mod's
// replace) is the upstream release changed by exactly the diff written
// down in app/third_party/go-app.diff. Set FIELDHEAD_WRITE_PATCH=1 to rewrite
// that file after changing the copy on purpose. (Source: the upstream
// release through the Go module proxy, checked against goappSum.)
func TestGoAppPatch(t *testing.T) {
	if _, err := exec.LookPath("diff"); err != nil {
		t.Skip("no diff program (GNU diffutils)")
	}
	out, err := exec.Command("go", "mod", "download", "-json", goappModule+"@"+goappVersion).Output()
	if err != nil {
		t.Fatalf("go mod download %s@%s: %v", goappModule, goappVersion, err)
	}
	var mod struct{ Dir, Sum, Error string }
	if err := json.Unmarshal(out, &mod); err != nil || mod.Error != "" {
		t.Fatalf("go mod download: %v %s", err, mod.Error)
	}
	if mod.Sum != goappSum {
		t.Fatalf("upstream %s@%s has checksum %s, want %s", goappModule, goappVersion, mod.Sum, goappSum)
	}
	got, err := goappDiff(mod.Dir, filepath.Join("third_party", "go-app"))
	if err != nil {
		t.Fatal(err)
	}
	if got == "" {
		t.Fatal("the copy equals upstream: drop the replace in go.mod instead")
	}
	recorded := filepath.Join("third_party", "go-app.diff")
	if os.Getenv("FIELDHEAD_WRITE_PATCH") == "1" {
		if err := os.WriteFile(recorded, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(recorded)
	if err != nil {
		t.Fatal(err)
	}
	if got != string(want) {
		t.Errorf("app/third_party/go-app differs from upstream by more or less than app/third_party/go-app.diff; the diff now is:\n%s", got)
	}
	gomod, err := os.ReadFile(filepath.Join("..", "go.mod"))
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(gomod), "replace "+goappModule+" => ./app/third_party/go-app") {
		t.Error("go.mod does not replace go-app with the copy")
	}
}

// TestWasmPackages: the wasm build links neither net/http (go-app's server
// side, kept out by the patch) nor the brotli encoder (the site writer's).
// (Source: this project's size budget; `go list -deps` is the linker's
// package set.)
func TestWasmPackages(t *testing.T) {
	cmd := exec.Command("go", "list", "-deps", ".")
	cmd.Env = append(os.Environ(), "GOOS=js", "GOARCH=wasm")
	out, err := cmd.Output()
	if err != nil {
		t.Fatalf("go list -deps for the wasm: %v", err)
	}
	deps := strings.Fields(string(out))
	if len(deps) < 20 || !contains(deps, goappModule+"/pkg/app") {
		t.Fatalf("go list -deps gave %d packages without go-app: the listing is wrong", len(deps))
	}
	for _, d := range deps {
		switch {
		case d == "net/http", strings.HasPrefix(d, "net/http/"), d == "crypto/tls", d == "crypto/x509",
			strings.HasPrefix(d, "github.com/andybalholm/brotli"), d == "compress/gzip",
			// Each took KBs of the wasm for a few lines of use (app/third_party/README.md, present's writeCSV,
			// scenario's crc32IEEE, go-app's escapeText).
			d == "regexp", d == "encoding/csv", d == "hash/crc32", d == "bufio", d == "html",
			// go-app's states, storage values, encryption and notifications, unused here (app/third_party/README.md).
			d == "encoding/json", d == "crypto", strings.HasPrefix(d, "crypto/"), d == "github.com/google/uuid",
			d == "database/sql/driver":
			t.Errorf("the wasm links %s", d)
		}
	}
}

func contains(list []string, s string) bool {
	for _, v := range list {
		if v == s {
			return true
		}
	}
	return false
}
