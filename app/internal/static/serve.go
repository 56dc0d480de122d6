//go:build !wasm

package static

import (
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"io/fs"
	"mime"
	"net/http"
	"os"
	"path"
	"path/filepath"
	"strconv"
	"strings"
)

// Cache-Control values: a hashed name never changes content, so it is kept
// a year without asking; anything else is asked about on every use (a 304
// when unchanged).
const (
	CacheImmutable  = "public, max-age=31536000, immutable"
	CacheRevalidate = "no-cache"
)

// Handler serves the site folder dir under prefix ("" or "/a/b"), as
// described in the package comment. Requests outside prefix are sent to
// it.
func Handler(dir, prefix string) http.Handler {
	h := http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		serveFile(w, r, dir)
	})
	if prefix == "" {
		return h
	}
	mux := http.NewServeMux()
	mux.Handle(prefix+"/", http.StripPrefix(prefix, h))
	mux.Handle("/", http.RedirectHandler(prefix+"/", http.StatusFound))
	return mux
}

// ContentType is the media type a file is served with.
func ContentType(name string) string {
	switch path.Ext(name) {
	case ".wasm":
		return "application/wasm"
	case ".webmanifest":
		return "application/manifest+json"
	case ".js":
		return "text/javascript; charset=utf-8"
	}
	if t := mime.TypeByExtension(path.Ext(name)); t != "" {
		return t
	}
	return "application/octet-stream"
}

func serveFile(w http.ResponseWriter, r *http.Request, dir string) {
	if r.Method != http.MethodGet && r.Method != http.MethodHead {
		w.Header().Set("Allow", "GET, HEAD")
		http.Error(w, "method not allowed", http.StatusMethodNotAllowed)
		return
	}
	name := path.Clean("/" + r.URL.Path)
	if strings.HasSuffix(r.URL.Path, "/") {
		name = path.Join(name, "index.html")
	}
	file := filepath.Join(dir, filepath.FromSlash(name))
	if st, err := os.Stat(file); err != nil || st.IsDir() {
		http.NotFound(w, r)
		return
	}
	hdr := w.Header()
	hdr.Set("Content-Type", ContentType(name))
	if Hashed(name) {
		hdr.Set("Cache-Control", CacheImmutable)
	} else {
		hdr.Set("Cache-Control", CacheRevalidate)
	}
	send, enc := file, ""
	if compressible(name) {
		// Caches must keep the encodings apart, whether or not this
		// answer is compressed.
		hdr.Add("Vary", "Accept-Encoding")
		for _, e := range Preferred(r.Header.Get("Accept-Encoding")) {
			if _, err := os.Stat(file + Suffix(e)); err == nil {
				send, enc = file+Suffix(e), e
				break
			}
		}
	}
	f, err := os.Open(send)
	if err != nil {
		status := http.StatusInternalServerError
		if errors.Is(err, fs.ErrNotExist) {
			status = http.StatusNotFound
		}
		http.Error(w, http.StatusText(status), status)
		return
	}
	defer f.Close()
	st, err := f.Stat()
	if err != nil {
		http.Error(w, err.Error(), http.StatusInternalServerError)
		return
	}
	if enc != "" {
		hdr.Set("Content-Encoding", enc)
	}
	if !Hashed(name) {
		// A strong validator of this representation, so that a
		// revalidation of an unchanged file is a 304 with no body.
		b, err := os.ReadFile(send)
		if err == nil {
			sum := sha256.Sum256(b)
			tag := hex.EncodeToString(sum[:8])
			if enc != "" {
				tag += "-" + enc
			}
			hdr.Set("ETag", strconv.Quote(tag))
		}
	}
	http.ServeContent(w, r, name, st.ModTime(), f)
}

// Suffix is the file suffix of a compressed copy in an encoding.
func Suffix(enc string) string {
	if enc == "br" {
		return ".br"
	}
	return ".gz"
}

// Preferred lists the encodings we have that an Accept-Encoding header
// allows, best first: brotli before gzip (smaller), each only if its
// q-value is above zero, "*" standing for either.
func Preferred(accept string) []string {
	q := map[string]float64{}
	star := -1.0
	for _, part := range strings.Split(accept, ",") {
		fields := strings.Split(part, ";")
		token := strings.ToLower(strings.TrimSpace(fields[0]))
		if token == "" {
			continue
		}
		weight := 1.0
		for _, p := range fields[1:] {
			if v, ok := strings.CutPrefix(strings.TrimSpace(p), "q="); ok {
				if f, err := strconv.ParseFloat(v, 64); err == nil {
					weight = f
				}
			}
		}
		if token == "*" {
			star = weight
		} else {
			q[token] = weight
		}
	}
	var out []string
	for _, e := range []string{"br", "gzip"} {
		w, ok := q[e]
		if !ok {
			w = star
		}
		if w > 0 {
			out = append(out, e)
		}
	}
	return out
}
