package main

import (
	"reflect"
	"unsafe"
)

// same reports whether a and b are deeply equal, as reflect.DeepEqual
// does, for values that hold no cycle (the view model is a tree) and no
// map, interface or channel: one of those is equal only to itself. a and b
// are pointers to the two values, of one type.
//
// It walks both by the type's layout, read once (shapeOf), where DeepEqual
// works through reflect.Value field by field and records every pointer it
// follows: comparing the cards after each edit (redrawCards) was about a
// fifth of the edit's Go, and this is several times faster (BenchmarkSame).
// TestSameIsDeepEqual holds it to reflect.DeepEqual. (One function over a
// layout, not a function made per type nor a generic one: those cost 10 to
// 18 KB more of the wasm.)
func same(a, b any) bool {
	t := reflect.TypeOf(a)
	va, vb := reflect.ValueOf(a), reflect.ValueOf(b)
	if t.Kind() != reflect.Pointer || t != reflect.TypeOf(b) || va.IsNil() || vb.IsNil() {
		return a == b
	}
	return shapeOf(t.Elem()).equal(va.UnsafePointer(), vb.UnsafePointer())
}

// shape is a type's layout, as far as comparing two values needs it.
type shape struct {
	kind   reflect.Kind
	size   uintptr
	elem   *shape  // of a slice, an array or a pointer
	n      uintptr // an array's length
	fields []part  // a struct's fields of non-zero size
}

type part struct {
	off uintptr
	s   *shape
}

// shapes holds each type's layout once read. The page runs on one
// goroutine; the tests compare from one too.
var shapes = map[reflect.Type]*shape{}

func shapeOf(t reflect.Type) *shape {
	if s, ok := shapes[t]; ok {
		return s
	}
	s := &shape{kind: t.Kind(), size: t.Size()}
	shapes[t] = s // before its parts: a block holds a card, which holds blocks
	switch s.kind {
	case reflect.Struct:
		for i := range t.NumField() {
			if f := t.Field(i); f.Type.Size() > 0 { // noCompare has none
				s.fields = append(s.fields, part{f.Offset, shapeOf(f.Type)})
			}
		}
	case reflect.Slice, reflect.Pointer:
		s.elem = shapeOf(t.Elem())
	case reflect.Array:
		s.elem, s.n = shapeOf(t.Elem()), uintptr(t.Len())
	}
	return s
}

// sliceHeader is a slice's layout (the unsafe.Slice functions' model).
type sliceHeader struct {
	data     unsafe.Pointer
	len, cap int
}

// equal compares the values of s's type at a and b.
func (s *shape) equal(a, b unsafe.Pointer) bool {
	switch s.kind {
	case reflect.String:
		return *(*string)(a) == *(*string)(b)
	case reflect.Float64:
		return *(*float64)(a) == *(*float64)(b)
	case reflect.Float32:
		return *(*float32)(a) == *(*float32)(b)
	case reflect.Struct:
		for _, f := range s.fields {
			if !f.s.equal(unsafe.Add(a, f.off), unsafe.Add(b, f.off)) {
				return false
			}
		}
		return true
	case reflect.Slice:
		sa, sb := (*sliceHeader)(a), (*sliceHeader)(b)
		if sa.len != sb.len || (sa.data == nil) != (sb.data == nil) {
			return false
		}
		return sa.data == sb.data || s.elem.each(sa.data, sb.data, uintptr(sa.len))
	case reflect.Array:
		return s.elem.each(a, b, s.n)
	case reflect.Pointer:
		pa, pb := *(*unsafe.Pointer)(a), *(*unsafe.Pointer)(b)
		return pa == pb || (pa != nil && pb != nil && s.elem.equal(pa, pb))
	case reflect.Func: // as DeepEqual: equal only when both are nil
		return *(*unsafe.Pointer)(a) == nil && *(*unsafe.Pointer)(b) == nil
	}
	// Booleans and integers, equal when their bytes are; a map, an
	// interface or a channel only when it is the very same one.
	return unsafe.String((*byte)(a), s.size) == unsafe.String((*byte)(b), s.size)
}

// each compares n values of s's type laid out one after another.
func (s *shape) each(a, b unsafe.Pointer, n uintptr) bool {
	for i := range n {
		if !s.equal(unsafe.Add(a, i*s.size), unsafe.Add(b, i*s.size)) {
			return false
		}
	}
	return true
}
