package main

import (
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// survey is the box a survey table is pasted into and its button, which
// makes the line's segments from it (one Draft method, PasteProfile).
type survey struct {
	app.Compo
	S *sheet
	V present.Survey
}

// Render draws the box, its hint, the button and what the last paste said.
func (c *survey) Render() (ui app.UI) {
	defer containPart(c.S, "the survey box", &ui)
	v := c.V
	notes := make([]app.UI, len(v.Notes))
	for i, n := range v.Notes {
		notes[i] = app.Li().Text(n)
	}
	// The pipe button keeps its place (hidden when every segment has a
	// pipe): go-app matches elements by position.
	pipe := app.Button().Type("button").ID("survey-pipe").Class("act").Hidden(v.Pipe.Text == "")
	if v.Pipe.Text != "" {
		pipe = pipe.ID(v.Pipe.ID).Class(v.Pipe.Class).Disabled(v.Pipe.Disabled).Title(v.Pipe.Hint).
			Aria("describedby", v.ID+"-made "+v.ID+"-status").OnClick(c.onPipe)
	}
	return app.Details().Class("astext survey").Open(v.Open).Body(
		app.Summary().Text(v.Title),
		formBody("field", "",
			app.Label().For(v.ID).Class("lbl").Text(v.Label),
			app.Textarea().ID(v.ID).Class("box survey-text").Rows(6).Attr("spellcheck", "false").
				Attr("autocomplete", "off").Aria("describedby", v.ID+"-hint").Text(v.Text),
			app.P().ID(v.ID+"-hint").Class("muted").Text(v.Hint)),
		app.Button().Type("button").ID(v.Button.ID).Class(v.Button.Class).Text(v.Button.Text).OnClick(c.onPaste),
		app.P().ID(v.ID+"-made").Class("survey-made").Aria("live", "polite").Text(v.Made),
		app.P().ID(v.ID+"-status").Class("survey-made").Aria("live", "polite").Hidden(v.Status == "").Text(v.Status),
		pipe.Text(v.Pipe.Text),
		app.Ul().Class("msg warn survey-notes").Aria("live", "polite").Body(notes...),
	)
}

// onPipe gives segment 1's pipe to the segments without one.
func (c *survey) onPipe(ctx app.Context, e app.Event) {
	defer c.S.contain("giving segment 1's pipe to the other segments")
	c.S.d.GivePipe()
	c.S.copyNote = ""
	c.S.evaluate()
}

// onPaste makes the segments from the box's text; a paste whose every row
// was used empties the box.
func (c *survey) onPaste(ctx app.Context, e app.Event) {
	defer c.S.contain("making the segments from the survey")
	box := app.Window().GetElementByID(c.V.ID)
	c.S.d.PasteProfile(box.Get("value").String())
	if c.S.d.Survey == "" {
		box.Set("value", "")
	}
	c.S.copyNote = ""
	c.S.evaluate()
}
