package scenario

import (
	"fmt"
	"net/url"
	"sort"
	"strconv"
	"strings"
	"unicode"
	"unicode/utf8"
)

// MaxQueryBytes is the longest query string Parse accepts, not counting the
// check field Sign writes before it, and the longest canonical query
// (Encode) a link may carry. A real scenario is
// well under 1 KB; the limit keeps a damaged or hostile link from costing
// the page anything.
const MaxQueryBytes = 8 << 10

// known maps every parameter name, the segments' included, to its place
// in the canonical order: the segments' parameters come right after the
// single run's (after chw), segment by segment.
var known = func() map[string]int {
	segFields := SegmentFields
	m := make(map[string]int, len(Table)+MaxSegments*len(segFields))
	i := 0
	for _, p := range Table {
		if p.SegmentOnly {
			continue
		}
		m[p.Name] = i
		i++
		if p.Name == "chw" {
			for n := 1; n <= MaxSegments; n++ {
				for _, f := range segFields {
					m[SegmentParam(n, f)] = i
					i++
				}
			}
		}
	}
	return m
}()

// sortByLink sorts parameter names into the canonical order.
func sortByLink(keys []string) {
	sort.Slice(keys, func(i, j int) bool { return known[keys[i]] < known[keys[j]] })
}

// Scenario is a parsed share link: for each parameter, exactly the text the
// user typed. Values are interpreted by Evaluate, so a bad value is kept and
// reported rather than lost.
type Scenario struct {
	raw map[string]string
}

// Parse reads a query string (with or without a leading '?'). It fails only
// for a link that cannot be read as a whole: too long, not valid
// percent-encoding or UTF-8, or an unknown or repeated parameter. The
// error is data for present to word: a *LinkError for a link too long, a
// *DamagedLink for one that arrived damaged, else LinkErrors listing every
// problem, each naming its parameter where there is one.
func Parse(query string) (Scenario, error) {
	s := Scenario{raw: map[string]string{}}
	query = strings.ReplaceAll(strings.TrimPrefix(query, "?"), "&amp;", "&") // as a mail program may write "&"
	// The limit is on the sheet, not on the check field Sign puts before
	// it: a signed link of a sheet at the limit reads back.
	if n := len(query) - signedPrefix(query); n > MaxQueryBytes {
		return s, &LinkError{Kind: LinkTooLong, Size: n, Limit: MaxQueryBytes}
	}
	if query == "" {
		return s, nil
	}
	var errs LinkErrors
	check, cut := "", ""
	parts := strings.Split(query, "&")
	for i, part := range parts {
		if part == "" {
			continue
		}
		k, v, hasValue := strings.Cut(part, "=")
		if k == CheckParam || i == firstPart(parts) && mangledCheck(k, v) {
			check = v
			continue
		}
		if i == len(parts)-1 && (!hasValue || cutName(k)) {
			cut = part // the last part is not a whole parameter: the link ends inside one
		}
		k, v = lenientPercent(k), lenientPercent(v)
		key, err := url.QueryUnescape(k)
		if err != nil {
			errs = append(errs, &LinkError{Kind: LinkNameEncoding, Name: errName(k)})
			continue
		}
		val, err := url.QueryUnescape(v)
		if err != nil {
			errs = append(errs, &LinkError{Kind: LinkValueEncoding, Name: errName(key)})
			continue
		}
		if !utf8.ValidString(key) || !utf8.ValidString(val) {
			errs = append(errs, &LinkError{Kind: LinkNotUTF8, Name: errName(key)})
			continue
		}
		if strings.IndexFunc(key, unicode.IsControl) >= 0 {
			errs = append(errs, &LinkError{Kind: LinkControl, Name: errName(key)})
			continue
		}
		if _, ok := known[key]; !ok {
			errs = append(errs, &LinkError{Kind: LinkUnknown, Name: errName(key)})
			continue
		}
		if _, dup := s.raw[key]; dup {
			errs = append(errs, &LinkError{Kind: LinkTwice, Name: errName(key)})
			continue
		}
		// A value holding a control character (a line break a chat put in
		// it) is kept verbatim, for its box to show and Read to flag.
		if strings.IndexFunc(val, unicode.IsControl) >= 0 {
			errs = append(errs, &LinkError{Kind: LinkControl, Name: errName(key)})
		}
		s.raw[key] = val
	}
	// The canonical link must fit too, so that what Parse accepts always
	// reads back (escaping can triple the length of non-ASCII text).
	if n := len(s.Encode()); n > MaxQueryBytes {
		return Scenario{raw: map[string]string{}}, &LinkError{Kind: LinkTooLongOut, Size: n, Limit: MaxQueryBytes}
	}
	if d := s.damage(check, cut); d != nil {
		return s, d
	}
	if len(errs) > 0 {
		return s, errs
	}
	return s, nil
}

// Get returns the text of a parameter, "" when absent.
func (s Scenario) Get(param string) string { return s.raw[param] }

// Has reports whether the parameter is present with a non-blank value.
func (s Scenario) Has(param string) bool { return strings.TrimSpace(s.raw[param]) != "" }

// Set stores the text of a parameter; an empty text removes it. Set panics on
// nothing: an unknown parameter is kept out and reported by the returned error.
func (s *Scenario) Set(param, text string) error {
	if _, ok := known[param]; !ok {
		return &LinkError{Kind: LinkUnknown, Name: errName(param)}
	}
	if s.raw == nil {
		s.raw = map[string]string{}
	}
	if text == "" {
		delete(s.raw, param)
		return nil
	}
	s.raw[param] = text
	return nil
}

// Clone returns an independent copy.
func (s Scenario) Clone() Scenario {
	c := Scenario{raw: make(map[string]string, len(s.raw))}
	for k, v := range s.raw {
		c.raw[k] = v
	}
	return c
}

// Encode writes the canonical query string: parameters in the order of
// Params, escaped only where a URL needs it so that units stay readable
// (q=45L/s, fit=gate:2,exit:1).
func (s Scenario) Encode() string {
	keys := make([]string, 0, len(s.raw))
	for k := range s.raw {
		keys = append(keys, k)
	}
	sortByLink(keys)
	var b strings.Builder
	for i, k := range keys {
		if b.Len() > 0 {
			b.WriteByte('&')
		}
		b.WriteString(k)
		b.WriteByte('=')
		v := escape(s.raw[k])
		if i == 0 && mangledCheck(k, v) {
			// A first field of the check field's form ("k=12345678", the
			// extra ΣK) would read back as the check with its name altered
			// (Parse): its first character escaped, it reads back the same.
			v = fmt.Sprintf("%%%02X", v[0]) + v[1:]
		}
		b.WriteString(v)
	}
	return b.String()
}

// escape percent-encodes what a query value cannot hold literally, and
// leaves the characters of units and lists (/ : , . - * °) readable.
func escape(v string) string {
	var b strings.Builder
	for i := 0; i < len(v); i++ {
		c := v[i]
		switch {
		case 'a' <= c && c <= 'z', 'A' <= c && c <= 'Z', '0' <= c && c <= '9':
			b.WriteByte(c)
		case strings.IndexByte("-._~/:,*!()@$;'", c) >= 0:
			b.WriteByte(c)
		default:
			fmt.Fprintf(&b, "%%%02X", c)
		}
	}
	return b.String()
}

// lenientPercent escapes a '%' that does not start a %XX escape, so a
// link typed by hand (spd=90%) reads as meant rather than failing.
func lenientPercent(s string) string {
	if !strings.Contains(s, "%") {
		return s
	}
	var b strings.Builder
	for i := 0; i < len(s); i++ {
		if s[i] == '%' && !(i+2 < len(s) && isHex(s[i+1]) && isHex(s[i+2])) {
			b.WriteString("%25")
			continue
		}
		b.WriteByte(s[i])
	}
	return b.String()
}

func isHex(c byte) bool {
	return '0' <= c && c <= '9' || 'a' <= c && c <= 'f' || 'A' <= c && c <= 'F'
}

// truncate cuts s to 24 bytes with "…", at a rune boundary.
func truncate(s string) string {
	if len(s) <= 24 {
		return s
	}
	n := 24
	for n > 0 && !utf8.RuneStart(s[n]) {
		n--
	}
	return s[:n] + "…"
}

// errName is a parameter name as a LinkError keeps it: short, and ""
// when it is not text.
func errName(k string) string {
	if !utf8.ValidString(k) {
		return ""
	}
	return truncate(k)
}

// CheckParam is the link's integrity field: a short checksum of the
// canonical query. Sign writes it first, so that a link cut anywhere by a
// mail or chat program still carries it and no longer matches. A link
// that carries it and does not match, or that ends inside a parameter
// name, arrived damaged; a link typed by hand without it reads as it is.
const CheckParam = "ck"

// Sign returns the canonical query with its integrity field before it:
// ck=, the CRC-32 (IEEE) of the canonical query in eight hex digits, a
// dot, one character per block of parameters (blockChecks), a dot and the
// number of values, then the query. The blocks and the count let a
// damaged link say which values may be altered and whether one is lost;
// a link signed before them (eight hex digits alone) still reads, and
// says only that it is damaged.
func (s Scenario) Sign() string {
	q := s.Encode()
	if q == "" {
		return ""
	}
	return CheckParam + "=" + checksum(q) + "." + s.blockChecks(blockCount(len(s.raw))) + "." + strconv.Itoa(len(s.raw)) + "&" + q
}

// blockAlphabet writes one block's check: six bits of its CRC-32.
const blockAlphabet = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_"

// blockCount is the number of blocks for n parameters: about four each,
// so a check names at most a handful of values and adds a quarter of a
// character per value to the link.
func blockCount(n int) int { return max(1, (n+3)/4) }

// blocksOf are the two blocks whose checks cover a parameter, chosen by
// its name alone, so that a value lost in transit does not move the
// others'. A value is suspect only when both its blocks fail: an altered
// value fails its two, and the others in them mostly have a sound one.
func blocksOf(name string, blocks int) [2]int {
	a := int(crc32IEEE(name) % uint32(blocks))
	b := int(crc32IEEE(name+"#") % uint32(blocks))
	if a == b {
		b = (a + 1) % blocks
	}
	return [2]int{a, b}
}

// blockChecks writes, for each of the given number of blocks, the check
// of its parameters: name=value (as Encode writes them) joined by & in
// link order.
func (s Scenario) blockChecks(blocks int) string {
	texts := make([]strings.Builder, blocks)
	for _, k := range s.sortedKeys() {
		for _, i := range blocksOf(k, blocks) {
			b := &texts[i]
			if b.Len() > 0 {
				b.WriteByte('&')
			}
			b.WriteString(k + "=" + escape(s.raw[k]))
		}
	}
	out := make([]byte, blocks)
	for i := range texts {
		out[i] = blockAlphabet[crc32IEEE(texts[i].String())&63]
	}
	return string(out)
}

// sortedKeys lists the parameters held, in link order.
func (s Scenario) sortedKeys() []string {
	keys := make([]string, 0, len(s.raw))
	for k := range s.raw {
		keys = append(keys, k)
	}
	sortByLink(keys)
	return keys
}

// suspects lists the parameters held whose two blocks' checks do not
// match blocks (the block part of a check field), and whether a value was
// lost: fewer values than count (the count part, "" when not given), or a
// failing block that no suspect explains.
func (s Scenario) suspects(blocks, count string) (names []string, lost bool) {
	if n, err := strconv.Atoi(count); err == nil && n != len(s.raw) {
		lost = true
	}
	if blocks == "" || strings.Trim(blocks, blockAlphabet) != "" {
		return nil, lost
	}
	got := s.blockChecks(len(blocks))
	bad := map[int]bool{}
	for i := range blocks {
		if got[i] != blocks[i] {
			bad[i] = true
		}
	}
	explained := map[int]bool{}
	for _, k := range s.sortedKeys() {
		if bs := blocksOf(k, len(blocks)); bad[bs[0]] && bad[bs[1]] {
			names = append(names, k)
			explained[bs[0]], explained[bs[1]] = true, true
		}
	}
	return names, lost || len(explained) < len(bad)
}

// firstPart is the index of the first non-empty part of a link.
func firstPart(parts []string) int {
	for i, p := range parts {
		if p != "" {
			return i
		}
	}
	return -1
}

// mangledCheck reports whether the first field of a link, k=v, is the
// check field with its name altered in transit (a letter dropped or its
// case changed): v has the form Sign writes, and k is what is left of
// "ck". A sound link's first value never has that form.
func mangledCheck(k, v string) bool {
	whole, rest, withBlocks := strings.Cut(v, ".")
	if len(whole) != 8 || strings.Trim(whole, "0123456789abcdef") != "" {
		return false
	}
	if withBlocks {
		blocks, count, ok := strings.Cut(rest, ".")
		if _, err := strconv.Atoi(count); !ok || err != nil || strings.Trim(blocks, blockAlphabet) != "" {
			return false
		}
	}
	return len(k) <= 2 && strings.Trim(strings.ToLower(k), "ck") == ""
}

// signedPrefix is the length of the check field Sign writes first
// ("ck=" + 8 hex digits + "&"), 0 when query does not start with one.
func signedPrefix(query string) int {
	field, _, ok := strings.Cut(query, "&")
	if !ok || !strings.HasPrefix(field, CheckParam+"=") {
		return 0
	}
	return len(field) + 1
}

func checksum(q string) string { return fmt.Sprintf("%08x", crc32IEEE(q)) }

// crc32IEEE is CRC-32 with the IEEE polynomial (as hash/crc32's
// ChecksumIEEE, ISO 3309 / ITU-T V.42), bit by bit: a link is short, and
// hash/crc32 with its tables is several KB of the wasm.
func crc32IEEE(s string) uint32 {
	c := ^uint32(0)
	for i := 0; i < len(s); i++ {
		c ^= uint32(s[i])
		for k := 0; k < 8; k++ {
			c = c>>1 ^ 0xedb88320&-(c&1)
		}
	}
	return ^c
}

// DamagedLink is the error of a link that arrived damaged. What was read
// is kept in the Scenario Parse returns; Read counts its values.
type DamagedLink struct {
	Cut      string // the part the link ends in when it ends inside a parameter, cut to 24 bytes
	Mismatch bool   // the integrity field does not match what was read
	Read     int    // values read
	Last     string // the last parameter read, in link order
	// Suspect lists the values read whose block's check does not match:
	// among them are the altered ones. Lost is true when a block none of
	// them is in fails too: a value was lost whole (or its name altered).
	// Both are empty for a link signed without blocks.
	Suspect []string
	Lost    bool
}

// Error is a terse form for logs and tests; what users read comes from
// present.
func (d *DamagedLink) Error() string {
	why := "check does not match"
	if d.Cut != "" {
		why = "ends inside " + strconv.Quote(d.Cut)
	}
	return "link: damaged (" + why + "), " + strconv.Itoa(d.Read) + " values read, last " + strconv.Quote(d.Last)
}

// damage reports a damaged link: a check that does not match, or an end
// inside a parameter.
func (s Scenario) damage(check, cut string) *DamagedLink {
	whole, rest, _ := strings.Cut(check, ".")
	blocks, count, _ := strings.Cut(rest, ".")
	mismatch := check != "" && whole != checksum(s.Encode())
	if !mismatch && cut == "" {
		return nil
	}
	keys := make([]string, 0, len(s.raw))
	for k := range s.raw {
		keys = append(keys, k)
	}
	sortByLink(keys)
	d := &DamagedLink{Cut: truncate(cut), Mismatch: mismatch, Read: len(keys)}
	if mismatch {
		d.Suspect, d.Lost = s.suspects(blocks, count)
	}
	if len(keys) > 0 {
		d.Last = keys[len(keys)-1]
	}
	return d
}

// cutName reports whether k is not a parameter but the start of one (a
// link cut inside a name: "s11." of "s11.l", "pns" of "pnpsh").
func cutName(k string) bool {
	if _, ok := known[k]; ok || k == "" {
		return false
	}
	for name := range known {
		if strings.HasPrefix(name, k) {
			return true
		}
	}
	return false
}
