//go:build !wasm

package app

// Upstream's wiring of the engine's states (state_engine_wasm.go leaves
// them out of the browser build).

func (e *engineX) wireStates(ctx *Context) {
	ctx.observeState = e.states.Observe
	ctx.getState = e.states.Get
	ctx.setState = e.states.Set
	ctx.delState = e.states.Delete
}

func (e *engineX) cleanupExpiredStates() { e.states.CleanupExpiredPersistedStates(e.baseContext()) }

func (e *engineX) cleanupStates() { e.states.Cleanup() }
