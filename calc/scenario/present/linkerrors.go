package present

import (
	"errors"
	"strconv"
	"strings"

	"fieldhead/calc/scenario"
)

// The one place where a problem with a link as a whole, or with a line of
// a sheets file, is put into words. scenario reports it as data
// (scenario.LinkError, LinkErrors, DamagedLink, LineError); these
// errors quote no units, so the words are the same for SI and US sheets.

// LinkErrorText words an error of scenario.Parse, Scenario.Set or a line
// of a sheets file: several problems of one link joined by "; ", a
// damaged link as one sentence. An error of another kind keeps its own
// text; nil gives "".
func LinkErrorText(err error) string {
	var (
		list    scenario.LinkErrors
		one     *scenario.LinkError
		damaged *scenario.DamagedLink
		line    scenario.LineError
	)
	switch {
	case err == nil:
		return ""
	case errors.As(err, &line):
		return "line " + strconv.Itoa(line.Line) + ": " + LinkErrorText(line.Err)
	case errors.As(err, &damaged):
		return damagedText(damaged)
	case errors.As(err, &list):
		s := make([]string, len(list))
		for i, e := range list {
			s[i] = linkErrorText(e)
		}
		return strings.Join(s, "; ")
	case errors.As(err, &one):
		return linkErrorText(one)
	}
	return err.Error()
}

// paramName is a parameter as a link error names it: quoted as it
// arrived, with its label when it is one of ours.
func paramName(e *scenario.LinkError) string {
	if e.Name == "" {
		return "a parameter with no readable name"
	}
	q := strconv.Quote(e.Name)
	if _, _, ok := scenario.Lookup(e.Name); ok {
		return q + " (" + scenario.Label(e.Name) + ")"
	}
	return q
}

// linkErrorText words one problem of a link.
func linkErrorText(e *scenario.LinkError) string {
	n := paramName(e)
	switch e.Kind {
	case scenario.LinkTooLong:
		return "the link is " + strconv.Itoa(e.Size) + " bytes, longer than the " + strconv.Itoa(e.Limit) + " a link may hold"
	case scenario.LinkTooLongOut:
		return "the link would be " + strconv.Itoa(e.Size) + " bytes once written out (text other than plain letters and digits takes up to three times its length), longer than the " +
			strconv.Itoa(e.Limit) + " a link may hold"
	case scenario.LinkNameEncoding:
		return "a parameter name is not valid percent-encoding (" + strconv.Quote(e.Name) + ")"
	case scenario.LinkValueEncoding:
		return n + ": the value is not valid percent-encoding"
	case scenario.LinkNotUTF8:
		if e.Name == "" {
			return "a parameter's name or value is not valid UTF-8 text"
		}
		return n + ": the value is not valid UTF-8 text"
	case scenario.LinkControl:
		return n + ": the value holds control characters, which no field takes"
	case scenario.LinkUnknown:
		return n + ": not a Fieldhead parameter"
	case scenario.LinkTwice:
		return n + ": given twice; keep one"
	case scenario.LinkNone:
		return "no link after the title"
	case scenario.LinkEmpty:
		return "the link holds no value of a sheet"
	}
	return n + ": the link could not be read"
}

// damagedText words a link that arrived damaged: why, what was kept, and
// what to do.
func damagedText(d *scenario.DamagedLink) string {
	why := "its check does not match what arrived"
	if d.Cut != "" {
		why = "it ends in the middle of a value (" + d.Cut + ")"
	}
	read := "nothing could be read"
	switch {
	case len(d.Suspect) > 0 && d.Cut == "":
		names := make([]string, len(d.Suspect))
		for i, p := range d.Suspect {
			names[i] = scenario.Label(p) + " (" + p + ")"
		}
		read = strconv.Itoa(d.Read) + " values were read; the ones that may be altered are among these: " + strings.Join(names, ", ")
		if d.Lost {
			read += "; and a value may be missing"
		}
	case d.Lost && d.Cut == "":
		read = strconv.Itoa(d.Read) + " values were read and match; a value is missing, or its name was altered"
	case d.Read > 0:
		read = strconv.Itoa(d.Read) + " values were read, the last " + scenario.Label(d.Last) + " (" + d.Last + "); what followed it is missing or altered"
	}
	return "the link arrived damaged — " + why + ": " + read + ". Every figure is unverified until you check those values and confirm them. Ask for the link again, or copy it whole."
}

// LinkBanner is the page's notice of a link not read whole, after its
// "Link" tag: text is what LinkErrorText (or LinkRefused) said; damaged
// when the link arrived damaged, and then the sheet kept on the device is
// left alone until this one is edited.
func LinkBanner(text string, damaged bool) string {
	if damaged {
		return text + " The sheet kept on this device is unchanged until you edit this one."
	}
	return "Part of the link was not understood and was left out: " + text
}

// LinkRefused says why a link refused as a whole was not used (text, from
// LinkErrorText) and what opened in its place: the sheet saved on this
// device (saved), else the demo.
func LinkRefused(text string, saved bool) string {
	instead := "this is the demo"
	if saved {
		instead = "this is the sheet saved on this device"
	}
	return "the link could not be used (" + text + "); " + instead
}

// ImportNotice says what adding a sheets file did: the sheets added, those
// kept already, and each line not read with why.
func ImportNotice(added, same int, bad []scenario.LineError) string {
	msg := "Added " + strconv.Itoa(added) + " sheets"
	if same > 0 {
		msg += "; " + strconv.Itoa(same) + " were kept already"
	}
	msg += "."
	for _, b := range bad {
		msg += " Line " + strconv.Itoa(b.Line) + " not read: " + strings.TrimSuffix(LinkErrorText(b.Err), ".") + "."
	}
	return msg
}
