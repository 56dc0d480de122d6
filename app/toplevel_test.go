//go:build !wasm

package main

import (
	"os/exec"
	"sort"
	"strings"
	"testing"
)

// TestTopLevel: the repository's top level holds only the entries of the
// design card (issue 19): app, calc, web, testdata, the Makefile, go.mod,
// go.sum, README.md and DEVELOPERS.md, plus .ci/ and dotfiles. Anything
// else belongs in one of those folders (DEVELOPERS.md, Layout). The
// tracked files are read from git (build outputs are not tracked).
func TestTopLevel(t *testing.T) {
	if _, err := exec.LookPath("git"); err != nil {
		t.Skip("no git")
	}
	out, err := exec.Command("git", "-C", "..", "ls-files").Output()
	if err != nil {
		t.Skipf("git ls-files: %v (not a git checkout)", err)
	}
	allowed := map[string]bool{
		"app": true, "calc": true, "web": true, "testdata": true, "Makefile": true,
		"go.mod": true, "go.sum": true, "README.md": true, "DEVELOPERS.md": true,
	}
	seen := map[string]bool{}
	for _, f := range strings.Split(strings.TrimSpace(string(out)), "\n") {
		top, _, _ := strings.Cut(f, "/")
		if top != "" {
			seen[top] = true
		}
	}
	if !seen["app"] || !seen["go.mod"] {
		t.Fatalf("git ls-files gave %d top-level entries without app or go.mod: the listing is wrong", len(seen))
	}
	var extra []string
	for top := range seen {
		if !allowed[top] && !strings.HasPrefix(top, ".") {
			extra = append(extra, top)
		}
	}
	sort.Strings(extra)
	if len(extra) > 0 {
		t.Errorf("the top level holds %s, outside the design's entries: move them under app, calc, web or testdata", strings.Join(extra, ", "))
	}
}
