//go:build wasm

package app

import "time"

// The browser build leaves states out (ObserveState, GetState, SetState,
// DelState; app/third_party/README.md): Fieldhead uses none, and wiring
// them linked the state manager, its storage, broadcast and JSON paths
// (about 86 KB of the wasm). Each call logs errNoJSON and changes
// nothing; the Observer and State it returns take their options and do
// nothing. With no states there are none to sweep or clean up.

func (e *engineX) wireStates(ctx *Context) {
	ctx.observeState = func(_ Context, _ string, _ any) Observer {
		Log(errNoJSON)
		return Observer{setObserver: func(o Observer) Observer { return o }, enableBroadcast: func() {}}
	}
	ctx.getState = func(Context, string, any) { Log(errNoJSON) }
	ctx.setState = func(_ Context, _ string, v any) State {
		Log(errNoJSON)
		return State{
			value:     v,
			expire:    func(s State, _ time.Time) State { return s },
			persist:   func(s State, _ bool) State { return s },
			broadcast: func(s State) State { return s },
		}
	}
	ctx.delState = func(Context, string) { Log(errNoJSON) }
}

func (e *engineX) cleanupExpiredStates() {}

func (e *engineX) cleanupStates() {}
