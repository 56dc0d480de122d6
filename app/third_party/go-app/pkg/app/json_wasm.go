//go:build wasm

package app

import (
	"math/rand/v2"
	"strconv"

	"github.com/maxence-charriere/go-app/v10/pkg/errors"
)

// The browser build links neither encoding/json nor crypto nor uuid (about
// 150 KB of gzip). The features that need them (states, Encrypt/Decrypt,
// LocalStorage/SessionStorage values, notifications, DeviceID) report
// errNoJSON here. Only the internal URL list read at start-up is decoded,
// by the browser's own JSON.parse.

var errNoJSON = errors.New("go-app: JSON values, states, storage and encryption are left out of this wasm build (app/third_party/README.md)")

type jsonRawMessage = []byte

func jsonMarshal(v any) ([]byte, error) { return nil, errNoJSON }

func jsonUnmarshal(b []byte, v any) error {
	p, ok := v.(*[]string)
	if !ok || len(b) == 0 {
		return errNoJSON
	}
	a := Window().Get("JSON").Call("parse", string(b))
	*p = (*p)[:0]
	if a.Type() != TypeObject || !a.Get("length").Truthy() {
		return nil
	}
	for i, n := 0, a.Length(); i < n; i++ {
		if s := a.Index(i); s.Type() == TypeString {
			*p = append(*p, s.String())
		}
	}
	return nil
}

// newID is a random version 4 UUID, from the runtime-seeded generator
// (an identifier, not a secret).
func newID() string {
	var b [16]byte
	for i := range b {
		b[i] = byte(rand.Uint32())
	}
	b[6] = b[6]&0x0f | 0x40
	b[8] = b[8]&0x3f | 0x80
	s := make([]byte, 0, 36)
	for i, c := range b {
		if i == 4 || i == 6 || i == 8 || i == 10 {
			s = append(s, '-')
		}
		if c < 16 {
			s = append(s, '0')
		}
		s = strconv.AppendUint(s, uint64(c), 16)
	}
	return string(s)
}

func encrypt(key string, v []byte) ([]byte, error) { return nil, errNoJSON }

func decrypt(key string, v []byte) ([]byte, error) { return nil, errNoJSON }
