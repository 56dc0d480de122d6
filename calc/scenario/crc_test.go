package scenario

import (
	"hash/crc32"
	"testing"
)

// TestCRC32IEEE checks the link's checksum against the standard library's
// hash/crc32 (IEEE), and the check value of the CRC catalogues ("123456789"
// → cbf43926, CRC-32/ISO-HDLC).
func TestCRC32IEEE(t *testing.T) {
	if got := crc32IEEE("123456789"); got != 0xcbf43926 {
		t.Errorf("crc32IEEE(123456789) = %08x, want cbf43926", got)
	}
	for _, s := range []string{"", "a", "q=45L/s&view=balance", Demo().Encode(), "µ³−\x00\xff"} {
		if got, want := crc32IEEE(s), crc32.ChecksumIEEE([]byte(s)); got != want {
			t.Errorf("crc32IEEE(%q) = %08x, hash/crc32 gives %08x", s, got, want)
		}
	}
}
