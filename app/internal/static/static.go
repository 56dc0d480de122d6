//go:build !wasm

// Package static prepares a written site folder for transfer and serves it
// the way a well-set static host does. It runs natively only: the site
// writer (app/native.go), the development server and the bench use it,
// and the brotli encoder it imports never reaches the wasm.
//
//   - Fingerprint gives the wasm and every asset a name made of its
//     content's hash, so a host can let browsers keep them for a year
//     without ever asking again, and a new build can never be mixed with
//     an old copy.
//   - Compress writes a brotli (quality 11) and a gzip (-9) copy beside
//     each text and wasm file, so the host sends compressed bytes without
//     compressing on every request.
//   - Handler serves the folder: the compressed copy the browser accepts
//     (Content-Encoding, Vary: Accept-Encoding), hashed names as
//     immutable, the page, worker and manifest revalidated (no-cache with
//     an ETag, so an unchanged file costs a 304).
package static

import (
	"bytes"
	"compress/gzip"
	"crypto/sha256"
	"encoding/hex"
	"fmt"
	"io/fs"
	"os"
	"os/exec"
	"path"
	"path/filepath"
	"regexp"
	"sort"
	"strings"
	"sync"

	"github.com/andybalholm/brotli"
)

// hashLen is the number of hex digits of a content hash in a file name:
// 40 bits, ample to tell apart the few versions of one file a browser
// might hold.
const hashLen = 10

// hashed matches a fingerprinted name: "app.0123456789.wasm".
var hashed = regexp.MustCompile(`\.[0-9a-f]{` + fmt.Sprint(hashLen) + `}\.[A-Za-z0-9]+$`)

// Hashed reports whether a file name carries its content's hash.
func Hashed(name string) bool { return hashed.MatchString(name) }

// revalidated are the files whose URL must stay fixed: the pages (links
// and bookmarks point at them), the service worker (the browser checks
// its URL for updates) and the manifest (the installed app's identity).
func revalidated(rel string) bool {
	base := path.Base(rel)
	return strings.HasSuffix(base, ".html") || base == "app-worker.js" || base == "manifest.webmanifest"
}

// textual are the file kinds worth compressing, and where references to
// other files are rewritten.
func textual(name string) bool {
	switch path.Ext(name) {
	case ".html", ".js", ".css", ".svg", ".webmanifest", ".json", ".txt", ".xml":
		return true
	}
	return false
}

// Fingerprint renames every file of the site in dir but the revalidated
// ones to name.<hash>.ext and rewrites each quoted reference to it
// (`"<prefix>/web/app.wasm"`) in the site's text files. A file is hashed
// only after the references inside it are rewritten, so a hash covers
// what the file points at (app.js's hash changes with the wasm's). It
// returns the renames, old URL path to new.
func Fingerprint(dir, prefix string) (map[string]string, error) {
	files := map[string][]byte{} // rel (slash) → content
	err := filepath.WalkDir(dir, func(p string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() {
			return err
		}
		rel, err := filepath.Rel(dir, p)
		if err != nil {
			return err
		}
		b, err := os.ReadFile(p)
		files[filepath.ToSlash(rel)] = b
		return err
	})
	if err != nil {
		return nil, err
	}
	var pending []string
	for rel := range files {
		if !revalidated(rel) && !Hashed(rel) {
			pending = append(pending, rel)
		}
	}
	sort.Strings(pending)
	urlOf := func(rel string) string { return prefix + "/" + rel }
	refers := func(in, to string) bool {
		return textual(in) && bytes.Contains(files[in], []byte(`"`+urlOf(to)+`"`))
	}
	renames := map[string]string{}
	for len(pending) > 0 {
		progress := false
		for i := 0; i < len(pending); i++ {
			rel := pending[i]
			leaf := true
			for _, other := range pending {
				if other != rel && refers(rel, other) {
					leaf = false
					break
				}
			}
			if !leaf {
				continue
			}
			sum := sha256.Sum256(files[rel])
			ext := path.Ext(rel)
			newRel := strings.TrimSuffix(rel, ext) + "." + hex.EncodeToString(sum[:])[:hashLen] + ext
			old, repl := []byte(`"`+urlOf(rel)+`"`), []byte(`"`+urlOf(newRel)+`"`)
			for f, b := range files {
				if textual(f) {
					files[f] = bytes.ReplaceAll(b, old, repl)
				}
			}
			files[newRel] = files[rel]
			delete(files, rel)
			renames[urlOf(rel)] = urlOf(newRel)
			pending = append(pending[:i], pending[i+1:]...)
			i--
			progress = true
		}
		if !progress {
			return nil, fmt.Errorf("fingerprinting: files refer to each other in a circle: %v", pending)
		}
	}
	// Write the result back: new names, rewritten texts.
	for rel := range renames {
		if err := os.Remove(filepath.Join(dir, filepath.FromSlash(strings.TrimPrefix(rel, prefix+"/")))); err != nil {
			return nil, err
		}
	}
	for rel, b := range files {
		if err := os.WriteFile(filepath.Join(dir, filepath.FromSlash(rel)), b, 0o644); err != nil {
			return nil, err
		}
	}
	return renames, nil
}

// compressible are the files Compress writes compressed copies of.
func compressible(name string) bool {
	return textual(name) || path.Ext(name) == ".wasm"
}

// Brotli compresses b at brotli's best quality with its largest window
// (the wasm is several MB; a 16 MB window sees all of it).
func Brotli(b []byte) []byte {
	var buf bytes.Buffer
	w := brotli.NewWriterOptions(&buf, brotli.WriterOptions{Quality: brotli.BestCompression, LGWin: 24})
	w.Write(b)
	w.Close()
	return buf.Bytes()
}

// Gzip compresses b with gzip -9: GNU gzip's when it is installed (about
// 1 % smaller on the wasm than Go's compress/gzip at its best), else Go's.
func Gzip(b []byte) []byte {
	if p, err := exec.LookPath("gzip"); err == nil {
		cmd := exec.Command(p, "-9", "-n", "-c")
		cmd.Stdin = bytes.NewReader(b)
		if out, err := cmd.Output(); err == nil {
			return out
		}
	}
	var buf bytes.Buffer
	w, _ := gzip.NewWriterLevel(&buf, gzip.BestCompression)
	w.Write(b)
	w.Close()
	return buf.Bytes()
}

// Compress writes name.br and name.gz beside every text and wasm file
// under dir. cache, if not "", is a folder where compressed copies are
// kept by content hash between builds: brotli's best quality takes tens
// of seconds on the wasm, which an unchanged wasm need not pay again.
func Compress(dir, cache string) error {
	var names []string
	err := filepath.WalkDir(dir, func(p string, d fs.DirEntry, err error) error {
		if err == nil && !d.IsDir() && compressible(p) {
			names = append(names, p)
		}
		return err
	})
	if err != nil {
		return err
	}
	if cache != "" {
		if err := os.MkdirAll(cache, 0o755); err != nil {
			return err
		}
	}
	// The wasm dominates; the two encodings of it run side by side.
	var wg sync.WaitGroup
	var mu sync.Mutex
	var first error
	used := map[string]bool{} // cache entries of this build
	for _, name := range names {
		b, err := os.ReadFile(name)
		if err != nil {
			return err
		}
		sum := sha256.Sum256(b)
		key := hex.EncodeToString(sum[:])
		used[key+".br"], used[key+".gz"] = true, true
		for _, enc := range []struct {
			ext string
			fn  func([]byte) []byte
		}{{".br", Brotli}, {".gz", Gzip}} {
			wg.Add(1)
			go func() {
				defer wg.Done()
				out, err := cached(cache, key+enc.ext, func() []byte { return enc.fn(b) })
				if err == nil {
					err = os.WriteFile(name+enc.ext, out, 0o644)
				}
				if err != nil {
					mu.Lock()
					if first == nil {
						first = err
					}
					mu.Unlock()
				}
			}()
		}
	}
	wg.Wait()
	if first != nil || cache == "" {
		return first
	}
	// Keep only this build's copies: the cache stays one build large.
	old, err := os.ReadDir(cache)
	if err != nil {
		return err
	}
	for _, e := range old {
		if !used[e.Name()] {
			os.Remove(filepath.Join(cache, e.Name()))
		}
	}
	return nil
}

// cached returns the file key from the cache folder, or makes it and
// keeps it there.
func cached(cache, key string, make func() []byte) ([]byte, error) {
	if cache == "" {
		return make(), nil
	}
	p := filepath.Join(cache, key)
	if b, err := os.ReadFile(p); err == nil {
		return b, nil
	}
	b := make()
	tmp := p + ".tmp"
	if err := os.WriteFile(tmp, b, 0o644); err != nil {
		return nil, err
	}
	return b, os.Rename(tmp, p)
}
