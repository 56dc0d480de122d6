package main

import (
	"math/rand/v2"
	"strconv"
	"time"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// The sheets kept on this device, in the browser's IndexedDB (database
// "fieldhead", object store "sheets", one record per sheet, keyed by its
// id). localStorage keeps only the link of the sheet open last, so that the
// bare page reopens it.

const (
	dbName    = "fieldhead"
	dbVersion = 1
	dbStore   = "sheets"
)

// record is one kept sheet. Edited is when it was last edited, carried
// through sheets files (scenario.KeptSheet); 0 when not known (a sheet
// imported from a file of the older form, which gave no edit time).
type record struct {
	ID, Title, Link, Answer string
	Created, Edited         float64 // ms since 1970
}

func (r record) js() app.Value {
	o := app.Window().Get("Object").New()
	o.Set("id", r.ID)
	o.Set("title", r.Title)
	o.Set("link", r.Link)
	o.Set("answer", r.Answer)
	o.Set("created", r.Created)
	o.Set("edited", r.Edited)
	return o
}

func recordOf(v app.Value) record {
	str := func(k string) string {
		if x := v.Get(k); x.Truthy() {
			return x.String()
		}
		return ""
	}
	num := func(k string) float64 {
		if x := v.Get(k); x.Truthy() {
			return x.Float()
		}
		return 0
	}
	return record{ID: str("id"), Title: str("title"), Link: str("link"), Answer: str("answer"), Created: num("created"), Edited: num("edited")}
}

// newID makes an id for a new sheet: the time and a random part.
func newID() string {
	return strconv.FormatInt(time.Now().UnixMilli(), 36) + "-" + strconv.FormatUint(rand.Uint64()%(1<<32), 36)
}

// nowMs is the time in ms since 1970.
func nowMs() float64 { return float64(time.Now().UnixMilli()) }

// once calls f with the first argument of a JavaScript callback, then
// releases the callback.
func once(f func(app.Value)) app.Func {
	var fn app.Func
	fn = app.FuncOf(func(this app.Value, args []app.Value) any {
		defer fn.Release()
		var a app.Value
		if len(args) > 0 {
			a = args[0]
		}
		f(a)
		return nil
	})
	return fn
}

// openStore opens the database; done gets it, or a reason it cannot be
// used (storage blocked, private mode, no IndexedDB).
func openStore(done func(db app.Value, problem string)) {
	defer func() {
		if r := recover(); r != nil {
			done(nil, "the browser refused the store")
		}
	}()
	idb := app.Window().Get("indexedDB")
	if !idb.Truthy() {
		done(nil, "this browser offers no store for sheets")
		return
	}
	req := idb.Call("open", dbName, dbVersion)
	req.Set("onupgradeneeded", once(func(app.Value) {
		db := req.Get("result")
		if !db.Get("objectStoreNames").Call("contains", dbStore).Bool() {
			db.Call("createObjectStore", dbStore, map[string]any{"keyPath": "id"})
		}
	}))
	req.Set("onsuccess", once(func(app.Value) { done(req.Get("result"), "") }))
	req.Set("onerror", once(func(app.Value) { done(nil, "the browser refused the store: "+errorName(req)) }))
	req.Set("onblocked", once(func(app.Value) { done(nil, "the store is held by another open page of Fieldhead") }))
}

func errorName(req app.Value) string {
	if e := req.Get("error"); e.Truthy() {
		return e.Get("name").String()
	}
	return "unknown error"
}

// storeAll reads every kept sheet, newest first.
func storeAll(db app.Value, done func([]record, string)) {
	defer func() {
		if r := recover(); r != nil {
			done(nil, "reading the kept sheets failed")
		}
	}()
	req := db.Call("transaction", dbStore, "readonly").Call("objectStore", dbStore).Call("getAll")
	req.Set("onsuccess", once(func(app.Value) {
		res := req.Get("result")
		out := make([]record, 0, res.Length())
		for i := 0; i < res.Length(); i++ {
			out = append(out, recordOf(res.Index(i)))
		}
		sortKept(out)
		done(out, "")
	}))
	req.Set("onerror", once(func(app.Value) { done(nil, "reading the kept sheets failed: "+errorName(req)) }))
}

// storePut writes a sheet; done gets a reason when it could not (a full
// store).
func storePut(db app.Value, r record, done func(problem string)) {
	defer func() {
		if x := recover(); x != nil {
			done("the sheet could not be kept on this device")
		}
	}()
	tx := db.Call("transaction", dbStore, "readwrite")
	tx.Call("objectStore", dbStore).Call("put", r.js())
	tx.Set("oncomplete", once(func(app.Value) { done("") }))
	tx.Set("onabort", once(func(app.Value) { done("the sheet could not be kept on this device: " + errorName(tx)) }))
}

// storeDelete removes a sheet.
func storeDelete(db app.Value, id string, done func(problem string)) {
	defer func() {
		if x := recover(); x != nil {
			done("the sheet could not be deleted")
		}
	}()
	tx := db.Call("transaction", dbStore, "readwrite")
	tx.Call("objectStore", dbStore).Call("delete", id)
	tx.Set("oncomplete", once(func(app.Value) { done("") }))
	tx.Set("onabort", once(func(app.Value) { done("the sheet could not be deleted: " + errorName(tx)) }))
}

// download offers text as a file of the given name and type. The text
// goes over as bytes: a Go string reaches JavaScript through a TextDecoder,
// which drops a leading byte-order mark (the results table's).
func download(name, mime, text string) {
	defer func() { _ = recover() }()
	bytes := app.Window().Get("Uint8Array").New(len(text))
	app.CopyBytesToJS(bytes, []byte(text))
	blob := app.Window().Get("Blob").New([]any{bytes}, map[string]any{"type": mime})
	u := app.Window().Get("URL").Call("createObjectURL", blob)
	a := app.Window().Get("document").Call("createElement", "a")
	a.Set("href", u)
	a.Set("download", name)
	app.Window().Get("document").Get("body").Call("appendChild", a)
	a.Call("click")
	a.Call("remove")
	app.Window().Get("URL").Call("revokeObjectURL", u)
}

// localTime words a time (ms since 1970) the way the device does.
func localTime(ms float64) string {
	if !app.IsClient || ms == 0 {
		return ""
	}
	return app.Window().Get("Date").New(ms).Call("toLocaleString").String()
}
