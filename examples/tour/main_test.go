package main

import (
	"bytes"
	"io"
	"os"
	"regexp"
	"strings"
	"testing"
)

// TestReadmeTour checks that the tour in README.md is this program, and that
// every value its comments promise is what it prints.
func TestReadmeTour(t *testing.T) {
	readme, err := os.ReadFile("../../README.md")
	if err != nil {
		t.Fatal(err)
	}
	src, err := os.ReadFile("main.go")
	if err != nil {
		t.Fatal(err)
	}
	m := regexp.MustCompile("(?s)```go\n(.*?)```").FindSubmatch(readme)
	if m == nil {
		t.Fatal("README.md has no ```go block")
	}
	_, body, _ := bytes.Cut(src, []byte("\npackage main"))
	if !bytes.Equal(append([]byte("package main"), body...), m[1]) {
		t.Fatal("the tour in README.md and examples/tour/main.go differ; copy one to the other")
	}

	out := capture(t, main)
	lines := strings.Split(strings.TrimSpace(out), "\n")
	var want []string
	for _, c := range regexp.MustCompile(`(?m)\)\s+// (.*)$`).FindAllStringSubmatch(string(body), -1) {
		want = append(want, c[1])
	}
	if len(lines) != len(want) {
		t.Fatalf("printed %d lines, comments promise %d:\n%s", len(lines), len(want), out)
	}
	for i := range want {
		// A comment may add a note in parentheses after the value.
		if want[i] != lines[i] && !strings.HasPrefix(want[i], lines[i]+" (") {
			t.Errorf("line %d: printed %q, README says %q", i+1, lines[i], want[i])
		}
	}
}

func capture(t *testing.T, f func()) string {
	t.Helper()
	r, w, err := os.Pipe()
	if err != nil {
		t.Fatal(err)
	}
	stdout := os.Stdout
	os.Stdout = w
	f()
	os.Stdout = stdout
	w.Close()
	b, _ := io.ReadAll(r)
	return string(b)
}
