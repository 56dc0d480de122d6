package present

// The view model is plain values (strings, numbers, slices), so that a
// page can compare one card's part with the card on screen and draw it
// again only when it changed. No part holds a pointer to the scenario or
// the result.

// Sheet is everything a page shows for one scenario.
type Sheet struct {
	View  string // the view drawn: balance, convert, regime, line, pump, report
	US    bool   // US customary units
	Title Field  // the sheet's title box
	Name  string // the title for headings, "Untitled sheet" when none
	Tabs  []Button
	Units []Button
	// Cards are the view's cards in order; the page arranges them by ID.
	Cards []Card
	// Others lists, worded, the problems with inputs the view uses but
	// does not draw, so that none is hidden.
	Others   []string
	Cautions []string
	Methods  []Method
	// Unverified says, for a sheet opened from a damaged link, that every
	// figure is unverified and what to do; "" for a sound sheet. Verify
	// confirms the values.
	Unverified string
	Verify     Button
}

// Card is one card of a view.
type Card struct {
	ID       string
	Class    string // what the card is, for the style sheet: "answer-card", "point", "seg"…
	Title    string
	Num      string   // a badge before the title ("1", "2")
	Controls []Button // beside the title (a segment's ↑ ↓ ✕)
	Blocks   []Block
}

// BlockKind says what a Block draws.
type BlockKind uint8

const (
	BlockFields    BlockKind = iota // Fields side by side (one or more inputs)
	BlockSwitch                     // Switch: an either/or choice
	BlockText                       // Text as a paragraph (Class: computed, muted, note-text…)
	BlockAnswer                     // Answer: the card's headline figure
	BlockFacts                      // Facts as a definition list
	BlockLevel                      // Text as a verdict badge (Class: lvl-ok, lvl-caution, lvl-danger, lvl-none)
	BlockWarnings                   // Items: warnings about the results
	BlockTable                      // Table
	BlockChart                      // Chart with its caption (Text)
	BlockButtons                    // Buttons in a row
	BlockFittings                   // Fittings: the fitting editor
	BlockDataSheet                  // DataSheet: the pump's data-sheet table
	BlockBudget                     // Budget: where the head goes, as bars
	BlockNode                       // Node: a point or the pump in the list of segments
	BlockCard                       // Card: a card inside this one (a segment)
	BlockHeading                    // Text as a subheading
	BlockList                       // Items as a plain list (methods, cautions)
	BlockEmpty                      // nothing: keeps the place of a block that comes and goes
	BlockImport                     // a file picker that imports a sheets file (Text: its label)
	BlockSurvey                     // Survey: a box a survey table is pasted into, to make the segments
)

// Block is one part of a card; Kind says which of its fields apply. A
// card's blocks keep their number and order while a value is typed, so
// that the box being typed in is never drawn anew.
type Block struct {
	Kind      BlockKind
	ID, Class string
	Text      string
	Fields    []Field
	Switch    *Switch
	Answer    *Answer
	Facts     []Fact
	Items     []string
	Table     *Table
	Chart     *Chart
	Buttons   []Button
	Fittings  *Fittings
	DataSheet *DataSheet
	Budget    *Budget
	Node      *Node
	Card      *Card
	Survey    *Survey
}

// Survey is the box a table of chainage and elevation is pasted into and
// the button that makes the segments from it (scenario.Draft.PasteProfile).
type Survey struct {
	ID, Title, Label, Hint string
	Text                   string   // the pasted text kept while a row could not be used
	Made                   string   // what the last paste (or Pipe) made, "" before any
	Status                 string   // after a paste, the segments still without a pipe, as the sheet is now; "" when none
	Notes                  []string // what the last paste said: rows not used, segments kept
	Open                   bool     // drawn open (a paste left notes or made segments)
	Button                 Button
	// Pipe gives segment 1's pipe to the segments without one
	// (scenario.Draft.GivePipe); its Text is "" when every segment has one.
	Pipe Button
}

// FieldKind says how an input is drawn.
type FieldKind uint8

const (
	FieldQuantity FieldKind = iota // a box (numeric keypad) and a unit picker
	FieldPlain                     // a box alone
	FieldPicker                    // a picker of choices
	FieldRef                       // gauge or absolute, two buttons
	FieldSolved                    // the balance's unknown: its answer in place of a box
)

// Field is one input, drawn from the scenario: Box and the picked option
// are what the scenario holds (or what is being typed).
type Field struct {
	Param       string
	Kind        FieldKind
	ID          string // element id of the box or picker ("in-q", "in-s2-l")
	Label, Hint string
	Box         string
	Placeholder string
	Numeric     bool
	Options     []Option // the unit picker (FieldQuantity) or the choices (FieldPicker, FieldRef)
	Error       string   // why the value cannot be used, worded, "" when fine
	Keep        *Button  // keeps a value that looks like a slip as typed; nil unless it does
	Suspect     string   // the damaged link's check names this value as possibly altered, worded; "" otherwise
	Warn        bool     // a warning about the results names this value
	Solved      string   // FieldSolved: the answer
}

// Option is one option of a picker.
type Option struct {
	Value, Text string
	Selected    bool
}

// Action is what a button does to the sheet.
type Action struct {
	Do    string // choose, switch, seg-move, seg-remove, seg-add, row-add, row-remove, fit-step, keep
	Param string // the parameter, group or fitting list acted on
	Value string // the value chosen, the side, or the fitting key
	N     int    // a segment number, a row, a step (+1, −1)
	Step  int    // a segment's move: −1 up, +1 down
}

// Button is a push button.
type Button struct {
	_        noCompare
	ID, Text string
	Label    string // accessible name when Text is a symbol
	Hint     string // a second line (the views' tabs)
	Class    string
	On       bool // pressed (a switch's side, the view shown)
	Disabled bool
	Confirm  string // asked before acting, "" for none
	Act      Action
}

// Switch is an either/or choice drawn as buttons.
type Switch struct {
	Group, Label string
	Sides        []Button
}

// Answer is a card's headline: a figure in large type, or why there is
// none yet.
type Answer struct {
	Label   string
	Values  []Value // one or two figures (flow and head of an operating point)
	Subs    []string
	None    bool   // no answer: Why says what to check
	NoneID  string // id of the dash drawn when there is no answer
	Why     string
	Badge   string // a regime badge under the figure
	BadgeID string
}

// Value is a figure with the id the page gives it.
type Value struct{ ID, Text string }

// Fact is one line of a definition list.
type Fact struct {
	_                noCompare
	ID, Label, Value string
	Key              bool // a figure the card is for, in large type
}

// Table is a table of figures.
type Table struct {
	ID, Class string
	Head      []string
	Rows      []Row
	Foot      []Row
}

// Row is a table row; Head is its first cell, a row header.
type Row struct {
	Head     string
	HeadSpan int
	Class    string
	Cells    []Cell
}

// Cell is one table cell; Label repeats its column's head for the stacked
// layout on phones.
type Cell struct {
	_                      noCompare
	ID, Text, Label, Badge string
	Span                   int
	Error                  string // a worded problem with the value shown
	ErrorID                string
}

// Chart is a chart's data in display units; Kind is "pump" or "profile".
type Chart struct {
	ID, Kind, Caption string
	Title             string
	XLabel, YLabel    string
	Y2Label, Y3Label  string // efficiency and NPSH axes of the pump chart
	// YSpan, Y2Span and Y3Span are the least spans of the automatic axes
	// (0: none) in their display units, for a history: a drift within a
	// reading's usual scatter is drawn small, not across the strip.
	YSpan, Y2Span, Y3Span float64
	Curves                []Curve
	Markers               []Marker
	Bands                 []Band
}

// CurveRole says what a curve of a chart is.
type CurveRole uint8

const (
	RolePump CurveRole = iota
	RolePumpBase
	RoleDataPoints
	RoleSystem
	RoleEfficiency
	RoleNPSHRequired
	RoleNPSHAvailable
	RolePipe
	RoleEGL
	RoleHGL
	RoleVapour
	RoleSpeed // the pump at another speed (the speed that meets a flow)
	// The test at several flows: its tested head curve, the band's upper
	// and lower edges, and the line from the origin through the
	// guarantee point.
	RoleTested
	RoleTestedBand
	RoleOriginLine
	// A pump's history (Kind "history"): head, efficiencies and energy
	// per volume against the days since its first sheet.
	RoleHistoryHead
	RoleHistoryPumpEff
	RoleHistoryWireEff
	RoleHistoryEnergy
)

// Curve is one line of a chart.
type Curve struct {
	Role CurveRole
	Name string
	X, Y []float64
}

// Marker is a labelled point of a chart (an operating point, a node).
type Marker struct {
	X, Y  float64
	Label string
	Pump  bool // the pump on the profile
	Role  MarkRole
	// DX and DY are a measured point's ± in flow and head (display
	// units), 0 when unknown.
	DX, DY float64
	// Cross is a guarantee point's tolerance cross (display units): the
	// flow bar from X0 to X1 at Y, the head bar from Y0 to Y1 at X.
	Cross *Cross
}

// Cross is the tolerance cross of ISO 9906 about a guarantee point.
type Cross struct{ X0, X1, Y0, Y1 float64 }

// MarkRole says what a marker of the pump chart is.
type MarkRole uint8

const (
	MarkOperating MarkRole = iota // worked out: where pump and line meet
	MarkPeak                      // the best-efficiency point of the data sheet
	MarkMeasured                  // the field check's reading
	MarkGuarantee                 // the guarantee point, with its tolerance cross (Marker.Cross)
)

// Band is a shaded range of x; X1 below X0 means "to the right edge".
type Band struct {
	X0, X1 float64
	Label  string
	Keep   bool // a range to keep to (the preferred region), not one to avoid
}

// Fittings is the fitting editor of one run or segment.
type Fittings struct {
	Param  string
	AddID  string
	Items  []Fitting
	Add    []Option // the picker that adds a kind
	Usable bool     // the list can be read (else only the text box is offered)
	Open   bool     // show the list as text
	AsText Field
}

// Fitting is one kind of fitting in a list.
type Fitting struct {
	Key, Name string
	Count     int
	K         string // the loss coefficient used for one, with its method, once computed
	Less      Button
	More      Button
}

// DataSheet is the pump's data-sheet table: one row per point, one column
// per list parameter.
type DataSheet struct {
	Columns []Column
	Rows    []DataRow
	Add     Button
	AsText  []Field
	Note    string
}

// Column is one list of the data sheet.
type Column struct {
	Param, Head, Name string
	Optional          bool
	UnitID            string
	Units             []Option
	Error             string
}

// DataRow is one point of the data sheet.
type DataRow struct {
	Num    string
	Cells  []DataCell
	Remove Button
}

// DataCell is one value of a point.
type DataCell struct {
	ID, Text, Label string
	Bad             bool
	Param           string
	Row             int
}

// Budget is "where the head goes": each term of the balance as a bar.
type Budget struct {
	Sides []BudgetSide
	Note  string
}

// BudgetSide is one side of the balance.
type BudgetSide struct {
	Title, Total string
	Rows         []BudgetRow
}

// BudgetRow is one term of the balance.
type BudgetRow struct {
	Label, Head, Pressure string
	Width                 int // bar length, percent of the largest term
	Negative, Unknown     bool
}

// Node is a point or the pump in the list of segments.
type Node struct {
	ID, Num, Title, Detail string
	Pump                   bool
}

// Method names a method behind the figures and its source.
type Method struct{ What, How string }

// noCompare, a first field of no size, makes a struct not comparable with
// ==. The compiler then writes no equality function for it, nor one for
// each length of array a slice literal of it is built in: for the types
// the cards are made of, tens of KB of the wasm that nothing called.
type noCompare [0]func()
