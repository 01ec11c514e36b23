// Package tools finds the external programs some tests need (pdftotext,
// pdffonts, qpdf). A test suite must not pass silently without them: under
// CI (CI=true) a missing program fails the test; elsewhere the test is
// skipped with a notice naming the package to install.
package tools

import (
	"os"
	"os/exec"
	"testing"
)

// Install is the command that provides every program Need looks for.
const Install = "apt-get install -y poppler-utils qpdf"

// Need returns the path of the program name, failing the test under CI
// and skipping it with a visible notice elsewhere when it is missing.
func Need(t testing.TB, name string) string {
	t.Helper()
	p, err := exec.LookPath(name)
	if err == nil {
		return p
	}
	if os.Getenv("CI") == "true" {
		t.Fatalf("%s is not installed, and CI must run every test (%s; .ci/run does it)", name, Install)
	}
	t.Skipf("SKIPPED: %s not installed (%s)", name, Install)
	return ""
}
