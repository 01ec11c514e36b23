package main

import (
	"bytes"
	"crypto/sha256"
	"encoding/hex"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/doc/pdf"
)

// verifyCmd implements "plinth verify FILE.pdf [PATH] [--render]".
func verifyCmd(args []string, stdout, stderr io.Writer) int {
	var pos []string
	rerender := false
	for _, a := range args {
		switch {
		case a == "-h" || a == "--help":
			fmt.Fprint(stdout, helps["verify"])
			return exitOK
		case a == "--render" || a == "-render":
			rerender = true
		case strings.HasPrefix(a, "-") && a != "-":
			fmt.Fprintf(stderr, "plinth: verify: unknown flag %s\n", a)
			return exitErrors
		default:
			pos = append(pos, a)
		}
	}
	if len(pos) < 1 || len(pos) > 2 {
		fmt.Fprintln(stderr, "plinth: verify needs FILE.pdf and optionally PATH")
		return exitErrors
	}
	file := pos[0]
	data, err := os.ReadFile(file)
	if err != nil {
		fmt.Fprintf(stderr, "plinth: %s: %v\n", file, describe(err))
		return exitErrors
	}
	in, err := readInputs(data)
	if err != nil {
		fmt.Fprintf(stderr, "plinth: %s: %v\n", file, err)
		return exitErrors
	}
	fmt.Fprintf(stdout, "%s: %d embedded file%s, fingerprint %s, written by plinth %s\n", file, len(in.files), plural(len(in.files)), in.man.Fingerprint, in.man.Version)
	if len(in.man.Sets) > 0 {
		fmt.Fprintf(stdout, "  variant: --set %s\n", strings.Join(in.man.Sets, " --set "))
	}
	bad := 0
	fail := func(format string, a ...any) {
		bad++
		fmt.Fprintf(stdout, "MISMATCH "+format+"\n", a...)
	}
	// each file against the manifest
	listed := map[string]bool{}
	for _, f := range in.man.Files {
		listed[f.Name] = true
		d, ok := in.files[f.Name]
		if !ok {
			fail("%s: listed in the manifest, not embedded", f.Name)
			continue
		}
		sum := sha256.Sum256(d)
		if hex.EncodeToString(sum[:]) != f.SHA256 || len(d) != f.Size {
			fail("%s: SHA-256 %x, the manifest says %s", f.Name, sum, f.SHA256)
		}
	}
	for _, n := range in.names() {
		if !listed[n] {
			fail("%s: embedded but not in the manifest", n)
		}
	}
	fp, err := in.fingerprint()
	if err != nil {
		fail("%v", err)
	} else {
		if fp != in.man.Fingerprint {
			fail("fingerprint of the embedded files %s, the manifest says %s", fp, in.man.Fingerprint)
		}
		if texts, err := pdf.PageTexts(data); err != nil {
			fail("the pages cannot be read: %v", err)
		} else {
			var missing []string
			for i, t := range texts {
				if !strings.Contains(t, fp[:12]) {
					missing = append(missing, strconv.Itoa(i+1))
				}
			}
			if len(missing) > 0 {
				fail("page%s %s do%s not print the fingerprint %s of the embedded files", plural(len(missing)), strings.Join(missing, ", "), map[bool]string{true: "es", false: ""}[len(missing) == 1], fp[:12])
			} else {
				fmt.Fprintf(stdout, "  every page (%d) prints the fingerprint %s\n", len(texts), fp[:12])
			}
		}
		kw := infoFingerprint(data)
		switch {
		case kw == "":
			fail("the document information carries no input fingerprint")
		case kw != fp:
			fail("fingerprint of the embedded files %s, the document information says %s", fp, kw)
		}
	}
	if len(pos) == 2 {
		bad += compareWorking(stdout, in, pos[1])
	}
	if rerender {
		n, err := renderAgain(stdout, in, data)
		if err != nil {
			fmt.Fprintf(stderr, "plinth: %s: %v\n", file, err)
			return exitErrors
		}
		bad += n
	}
	if bad > 0 {
		fmt.Fprintf(stdout, "NOT VERIFIED: %d mismatch%s\n", bad, map[bool]string{true: "", false: "es"}[bad == 1])
		return exitNotOK
	}
	fmt.Fprintln(stdout, "verified")
	return exitOK
}

var keywordsRe = regexp.MustCompile(`/Keywords <FEFF([0-9A-Fa-f]*)>`)

// infoFingerprint is the "inputs:" fingerprint in the document
// information's Keywords ("" when there is none).
func infoFingerprint(data []byte) string {
	i := bytes.LastIndex(data, []byte("\ntrailer\n"))
	if i < 0 {
		return ""
	}
	m := keywordsRe.FindSubmatch(data[i:])
	if m == nil {
		return ""
	}
	kw := decodeUTF16hex(string(m[1]))
	for _, f := range strings.Fields(kw) {
		if v, ok := strings.CutPrefix(f, "inputs:"); ok {
			return v
		}
	}
	return ""
}

// decodeUTF16hex decodes the BMP hex digits the document information uses.
func decodeUTF16hex(h string) string {
	var b strings.Builder
	for i := 0; i+4 <= len(h); i += 4 {
		var r rune
		fmt.Sscanf(h[i:i+4], "%04X", &r)
		b.WriteRune(r)
	}
	return b.String()
}

// compareWorking lists the files of the working package at p that differ
// from the embedded ones; it returns the number of differences.
func compareWorking(w io.Writer, in *inputs, p string) int {
	dir := p
	if fi, err := os.Stat(p); err == nil && !fi.IsDir() {
		dir = filepath.Dir(p)
	}
	work := map[string][]byte{}
	filepath.WalkDir(dir, func(q string, d fs.DirEntry, err error) error {
		if err != nil {
			return nil
		}
		rel, _ := filepath.Rel(dir, q)
		rel = filepath.ToSlash(rel)
		if d.IsDir() {
			if rel != "." && (strings.HasPrefix(d.Name(), ".") || strings.HasPrefix(d.Name(), "_")) {
				return filepath.SkipDir
			}
			return nil
		}
		if d.Type().IsRegular() && !strings.HasPrefix(d.Name(), ".") && !strings.EqualFold(filepath.Ext(d.Name()), ".pdf") {
			if data, err := os.ReadFile(q); err == nil {
				work[rel] = data
			}
		}
		return nil
	})
	n := 0
	var names []string
	for k := range in.files {
		names = append(names, k)
	}
	sort.Strings(names)
	for _, k := range names {
		d, ok := work[k]
		switch {
		case !ok:
			fmt.Fprintf(w, "  removed  %s\n", k)
			n++
		case !bytes.Equal(d, in.files[k]):
			add, del := lineDiff(in.files[k], d)
			fmt.Fprintf(w, "  changed  %s (+%d -%d lines)\n", k, add, del)
			n++
		}
	}
	var extra []string
	for k := range work {
		// a new sheet is an input of a folder's run; a single sheet's
		// run reads other sheets only through its uses, which would
		// change the sheet itself
		if _, ok := in.files[k]; !ok && ((in.man.Sheet == "" && isSheetPath(k)) || k == "package.yaml") {
			extra = append(extra, k)
		}
	}
	sort.Strings(extra)
	for _, k := range extra {
		fmt.Fprintf(w, "  added    %s\n", k)
		n++
	}
	if n == 0 {
		fmt.Fprintf(w, "  %s: the files are those the PDF was made from\n", p)
	}
	return n
}

func isSheetPath(rel string) bool {
	return !strings.Contains(rel, "/") && strings.EqualFold(filepath.Ext(rel), ".md") && !strings.EqualFold(rel, "README.md") &&
		!strings.HasPrefix(rel, "_")
}

// lineDiff counts the lines added and removed from a to b (a longest
// common subsequence of lines; quadratic, for files of calc-sheet size,
// falling back to a count of differing lines past 4000 lines).
func lineDiff(a, b []byte) (add, del int) {
	la, lb := strings.Split(string(a), "\n"), strings.Split(string(b), "\n")
	if len(la)*len(lb) > 16e6 {
		ca := map[string]int{}
		for _, l := range la {
			ca[l]++
		}
		for _, l := range lb {
			if ca[l] > 0 {
				ca[l]--
			} else {
				add++
			}
		}
		for _, c := range ca {
			del += c
		}
		return add, del
	}
	prev := make([]int, len(lb)+1)
	cur := make([]int, len(lb)+1)
	for i := range la {
		for j := range lb {
			if la[i] == lb[j] {
				cur[j+1] = prev[j] + 1
			} else {
				cur[j+1] = max(prev[j+1], cur[j])
			}
		}
		prev, cur = cur, prev
	}
	common := prev[len(lb)]
	return len(lb) - common, len(la) - common
}

// renderAgain renders from the embedded inputs in a temporary folder and
// compares the bytes; it returns 1 on a difference.
func renderAgain(w io.Writer, in *inputs, data []byte) (int, error) {
	if in.man.Version != Version() {
		fmt.Fprintf(w, "  --render: the PDF was written by plinth %s, this is plinth %s: a byte comparison would not be meaningful; not compared\n", in.man.Version, Version())
		return 0, nil
	}
	dir, err := os.MkdirTemp("", "plinth-verify-*")
	if err != nil {
		return 0, err
	}
	defer os.RemoveAll(dir)
	pkg := filepath.Join(dir, "package")
	if err := in.writeTo(pkg); err != nil {
		return 0, err
	}
	out := filepath.Join(dir, "out.pdf")
	args := []string{in.target(pkg), "-o", out}
	for _, s := range in.man.Sets {
		args = append(args, "--set", s)
	}
	old, had := os.LookupEnv("SOURCE_DATE_EPOCH")
	if in.man.SourceDateEpoch != "" {
		os.Setenv("SOURCE_DATE_EPOCH", in.man.SourceDateEpoch)
	} else {
		os.Unsetenv("SOURCE_DATE_EPOCH")
	}
	var msgs bytes.Buffer
	st := render(args, io.Discard, &msgs)
	if had {
		os.Setenv("SOURCE_DATE_EPOCH", old)
	} else {
		os.Unsetenv("SOURCE_DATE_EPOCH")
	}
	if st == exitErrors {
		fmt.Fprintf(w, "MISMATCH --render: the embedded inputs do not render:\n%s", msgs.String())
		return 1, nil
	}
	again, err := os.ReadFile(out)
	if err != nil {
		return 0, err
	}
	if !bytes.Equal(again, data) {
		fmt.Fprintf(w, "MISMATCH --render: rendering the embedded inputs gives a different PDF (%d bytes, this one %d)\n", len(again), len(data))
		return 1, nil
	}
	fmt.Fprintln(w, "  --render: rendering the embedded inputs gives this PDF byte for byte")
	return 0, nil
}

// extractCmd implements "plinth extract FILE.pdf DIR".
func extractCmd(args []string, stdout, stderr io.Writer) int {
	var pos []string
	for _, a := range args {
		switch {
		case a == "-h" || a == "--help":
			fmt.Fprint(stdout, helps["extract"])
			return exitOK
		case strings.HasPrefix(a, "-") && a != "-":
			fmt.Fprintf(stderr, "plinth: extract: unknown flag %s\n", a)
			return exitErrors
		default:
			pos = append(pos, a)
		}
	}
	if len(pos) != 2 {
		fmt.Fprintln(stderr, "plinth: extract needs FILE.pdf and DIR")
		return exitErrors
	}
	data, err := os.ReadFile(pos[0])
	if err != nil {
		fmt.Fprintf(stderr, "plinth: %s: %v\n", pos[0], describe(err))
		return exitErrors
	}
	in, err := readInputs(data)
	if err != nil {
		fmt.Fprintf(stderr, "plinth: %s: %v\n", pos[0], err)
		return exitErrors
	}
	if err := in.writeTo(pos[1]); err != nil {
		fmt.Fprintf(stderr, "plinth: %v\n", err)
		return exitErrors
	}
	fmt.Fprintf(stdout, "%s: %d file%s written\n", pos[1], len(in.files), plural(len(in.files)))
	if len(in.man.Sets) > 0 {
		fmt.Fprintf(stdout, "the PDF is a variant: render with --set %s\n", strings.Join(in.man.Sets, " --set "))
	}
	return exitOK
}
