package app

import (
	"reflect"

	"github.com/maxence-charriere/go-app/v10/pkg/errors"
)

// Fieldhead: a new element's subtree is built in the browser by one call
// to goappBuild, a function the page's app.js defines (Fieldhead's does:
// app/loader.go), instead of one call from the wasm for every element,
// attribute, text and child appended. Each call out of the wasm passes
// its strings through wasm_exec.js and costs far more than the DOM work it
// asks for: most of a first draw's mount went there (make bench's profile
// of an offline reload). The tree is walked here as mountHTML walks it
// (components initialised, their OnMount dispatched and rendered, contexts
// and depths set), written into one buffer, built there in the same order
// (attributes set as setJSAttribute sets them, then the children
// appended), and the built nodes handed back in that order; each element's
// event handlers are then added as mountHTMLEventHandlers adds them.
// Without goappBuild (another page, a worker) mountHTML mounts as upstream.

// The kinds of node in a mount buffer (goappBuild reads the same).
const (
	batchElement   = 1 // tag, attributes, children
	batchElementNS = 2 // namespace, then as batchElement
	batchText      = 3 // text
	batchRaw       = 4 // raw HTML, of which the first node is kept
)

// mountBatch is one subtree being mounted: the buffer goappBuild reads,
// and the nodes it makes, in the order it makes them, with the context
// each element's event handlers get.
type mountBatch struct {
	buf   []byte
	nodes []UI
	ctxs  []Context
}

func (b *mountBatch) num(n int) {
	for n >= 0x80 {
		b.buf = append(b.buf, byte(n)|0x80)
		n >>= 7
	}
	b.buf = append(b.buf, byte(n))
}

func (b *mountBatch) str(s string) {
	b.num(len(s))
	b.buf = append(b.buf, s...)
}

func (b *mountBatch) node(v UI, ctx Context) {
	b.nodes = append(b.nodes, v)
	b.ctxs = append(b.ctxs, ctx)
}

// batchBuild is goappBuild once looked up, or nil when the page has none.
var (
	batchBuild   Value
	batchLooked  bool
	batchBufType Value
)

func canBatch() bool {
	if !batchLooked {
		batchLooked = true
		if IsClient {
			if f := Window().Get("goappBuild"); f != nil && f.Truthy() {
				batchBuild = f
				batchBufType = Window().Get("Uint8Array")
			}
		}
	}
	return batchBuild != nil
}

// mountBatched mounts v, an HTML element not yet mounted, and everything
// under it, building the DOM in one call to goappBuild.
func (m nodeManager) mountBatched(ctx Context, depth uint, v HTML) (UI, error) {
	var b mountBatch
	root, err := m.collect(ctx, depth, v, &b)
	if err != nil {
		return nil, err
	}
	buf := batchBufType.New(len(b.buf))
	copyBytesToJS(buf, b.buf)
	built := batchBuild.Invoke(buf)
	for i, n := range b.nodes {
		jv := built.Index(i)
		switch n := n.(type) {
		case *text:
			n.jsvalue = jv
		case *raw:
			n.jsElement = jv
		case HTML:
			n.setJSElement(jv)
			m.mountHTMLEventHandlers(b.ctxs[i], n)
		}
	}
	return root, nil
}

// collect walks v as Mount does and writes it into b.
func (m nodeManager) collect(ctx Context, depth uint, v UI, b *mountBatch) (UI, error) {
	ctx = m.context(ctx, v)

	switch v := v.(type) {
	case *text:
		if v.Mounted() {
			return m.mountText(v) // its error
		}
		b.buf = append(b.buf, batchText)
		b.str(v.value)
		b.node(v, ctx)
		return v, nil

	case HTML:
		if v.Mounted() {
			return nil, errors.New("html element is already mounted").
				WithTag("parent-type", reflect.TypeOf(v.parent())).
				WithTag("type", reflect.TypeOf(v)).
				WithTag("tag", v.Tag()).
				WithTag("depth", v.depth())
		}
		if ns := v.XMLNamespace(); ns != "" {
			b.buf = append(b.buf, batchElementNS)
			b.str(ns)
		} else {
			b.buf = append(b.buf, batchElement)
		}
		b.str(v.Tag())
		attrs := v.attrs()
		b.num(len(attrs))
		for name, value := range attrs {
			b.str(name)
			b.str(resolveAttributeURLValue(name, value, ctx.ResolveStaticResource))
		}
		b.node(v, ctx)

		v = v.setDepth(depth).(HTML)
		children := v.body()
		b.num(len(children))
		for i, child := range children {
			var err error
			if child, err = m.collect(ctx, depth+1, child, b); err != nil {
				return nil, errors.New("mounting child failed").
					WithTag("type", reflect.TypeOf(v)).
					WithTag("tag", v.Tag()).
					WithTag("depth", depth).
					WithTag("index", i).
					Wrap(err)
			}
			children[i] = child.setParent(v)
		}
		return v, nil

	case Composer:
		if v.Mounted() {
			return m.mountComponent(ctx, depth, v) // its error
		}
		v = v.setRef(v)
		v = v.setDepth(depth)
		if initializer, ok := v.(Initializer); ok {
			initializer.OnInit()
		}
		if preRenderer, ok := v.(PreRenderer); ok && IsServer {
			ctx.Dispatch(preRenderer.OnPreRender)
		}
		if mounter, ok := v.(Mounter); ok && IsClient {
			ctx.Dispatch(mounter.OnMount)
		}
		root, err := m.renderComponent(v)
		if err != nil {
			return nil, errors.New("rendering component failed").
				WithTag("type", reflect.TypeOf(v)).
				WithTag("depth", v.depth()).
				Wrap(err)
		}
		if root, err = m.collect(ctx, depth+1, root, b); err != nil {
			return nil, errors.New("mounting component root failed").
				WithTag("type", reflect.TypeOf(v)).
				WithTag("depth", v.depth()).
				Wrap(err)
		}
		v = v.setRoot(root.setParent(v))
		return v, nil

	case *raw:
		if v.Mounted() {
			return m.mountRawHTML(depth, v) // its error
		}
		b.buf = append(b.buf, batchRaw)
		b.str(v.value)
		b.node(v, ctx)
		return v, nil

	default:
		return m.Mount(ctx, depth, v) // its error
	}
}
