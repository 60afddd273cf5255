// Package api lists the exported API of hydrosize, one line per identifier,
// in the spirit of Go's api/go1.*.txt files. The committed listing
// (api.txt) and its test keep the API a promise: see api_test.go and
// DEVELOPERS.md.
package api

import (
	"bytes"
	"fmt"
	"go/ast"
	"go/parser"
	"go/printer"
	"go/token"
	"io/fs"
	"path"
	"path/filepath"
	"sort"
	"strings"
)

// Module is the module path that prefixes package paths in the listing.
const Module = "github.com/hydrosize/hydrosize"

// Lines returns the exported API of every public package under root (the
// module root), sorted. Packages under internal/ and examples/, main
// packages, test files and files with a "//go:build ignore" line are left out.
func Lines(root string) ([]string, error) {
	dirs := map[string][]string{}
	err := filepath.WalkDir(root, func(p string, d fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		rel, _ := filepath.Rel(root, p)
		rel = filepath.ToSlash(rel)
		if d.IsDir() {
			if rel == "internal" || rel == "examples" || strings.HasPrefix(d.Name(), ".") && rel != "." || d.Name() == "testdata" {
				return filepath.SkipDir
			}
			return nil
		}
		if strings.HasSuffix(p, ".go") && !strings.HasSuffix(p, "_test.go") {
			dirs[path.Dir(rel)] = append(dirs[path.Dir(rel)], p)
		}
		return nil
	})
	if err != nil {
		return nil, err
	}
	var out []string
	for dir, files := range dirs {
		lines, err := packageLines(dir, files)
		if err != nil {
			return nil, err
		}
		out = append(out, lines...)
	}
	sort.Strings(out)
	return out, nil
}

func packageLines(dir string, files []string) ([]string, error) {
	fset := token.NewFileSet()
	pkgPath := Module
	if dir != "." {
		pkgPath += "/" + dir
	}
	w := &writer{fset: fset, pkg: "pkg " + pkgPath + ", "}
	for _, name := range files {
		f, err := parser.ParseFile(fset, name, nil, parser.ParseComments)
		if err != nil {
			return nil, err
		}
		if f.Name.Name == "main" || ignored(f) {
			continue
		}
		for _, decl := range f.Decls {
			if err := w.decl(decl); err != nil {
				return nil, fmt.Errorf("%s: %w", fset.Position(decl.Pos()), err)
			}
		}
	}
	return w.lines, nil
}

func ignored(f *ast.File) bool {
	for _, cg := range f.Comments {
		if cg.Pos() > f.Package {
			break
		}
		for _, c := range cg.List {
			if strings.HasPrefix(c.Text, "//go:build") && strings.Contains(c.Text, "ignore") {
				return true
			}
		}
	}
	return false
}

type writer struct {
	fset  *token.FileSet
	pkg   string
	lines []string
}

func (w *writer) add(format string, args ...any) {
	w.lines = append(w.lines, w.pkg+fmt.Sprintf(format, args...))
}

func (w *writer) expr(e ast.Expr) string {
	var b bytes.Buffer
	printer.Fprint(&b, w.fset, e)
	return b.String()
}

func (w *writer) decl(d ast.Decl) error {
	switch d := d.(type) {
	case *ast.FuncDecl:
		w.funcDecl(d)
	case *ast.GenDecl:
		return w.genDecl(d)
	}
	return nil
}

func (w *writer) funcDecl(d *ast.FuncDecl) {
	if !d.Name.IsExported() {
		return
	}
	sig := w.signature(d.Type)
	if d.Recv == nil {
		w.add("func %s%s%s", d.Name.Name, w.typeParams(d.Type.TypeParams), sig)
		return
	}
	recv := w.expr(d.Recv.List[0].Type)
	base := strings.TrimPrefix(recv, "*")
	if i := strings.IndexByte(base, '['); i >= 0 {
		base = base[:i]
	}
	if !ast.IsExported(base) {
		return
	}
	w.add("method (%s) %s%s", recv, d.Name.Name, sig)
}

func (w *writer) typeParams(fl *ast.FieldList) string {
	if fl == nil {
		return ""
	}
	var parts []string
	for _, f := range fl.List {
		for _, n := range f.Names {
			parts = append(parts, n.Name+" "+w.expr(f.Type))
		}
	}
	return "[" + strings.Join(parts, ", ") + "]"
}

// signature prints a function type without parameter names.
func (w *writer) signature(t *ast.FuncType) string {
	s := "(" + w.fieldTypes(t.Params) + ")"
	if t.Results == nil || len(t.Results.List) == 0 {
		return s
	}
	res := w.fieldTypes(t.Results)
	if len(t.Results.List) == 1 && len(t.Results.List[0].Names) <= 1 {
		return s + " " + res
	}
	return s + " (" + res + ")"
}

func (w *writer) fieldTypes(fl *ast.FieldList) string {
	if fl == nil {
		return ""
	}
	var parts []string
	for _, f := range fl.List {
		n := max(len(f.Names), 1)
		for range n {
			parts = append(parts, w.expr(f.Type))
		}
	}
	return strings.Join(parts, ", ")
}

func (w *writer) genDecl(d *ast.GenDecl) error {
	var lastType string
	for _, spec := range d.Specs {
		switch s := spec.(type) {
		case *ast.TypeSpec:
			w.typeSpec(s)
		case *ast.ValueSpec:
			typ, err := w.valueType(d.Tok, s, lastType)
			if err != nil {
				return err
			}
			lastType = typ
			for _, n := range s.Names {
				if n.IsExported() {
					w.add("%s %s %s", d.Tok.String(), n.Name, typ)
				}
			}
		}
	}
	return nil
}

// valueType names the type of a const or var spec. Exported vars without an
// explicit type must be initialised by a composite literal or errors.New.
func (w *writer) valueType(tok token.Token, s *ast.ValueSpec, last string) (string, error) {
	if s.Type != nil {
		return w.expr(s.Type), nil
	}
	if tok == token.CONST {
		if len(s.Values) == 0 {
			return last, nil // repeats the previous spec (iota)
		}
		return "untyped", nil
	}
	if len(s.Values) == 0 {
		return "", fmt.Errorf("var %s: no type", s.Names[0].Name)
	}
	switch v := s.Values[0].(type) {
	case *ast.CompositeLit:
		return w.expr(v.Type), nil
	case *ast.UnaryExpr:
		if c, ok := v.X.(*ast.CompositeLit); ok && v.Op == token.AND {
			return "*" + w.expr(c.Type), nil
		}
	case *ast.CallExpr:
		if fn := w.expr(v.Fun); fn == "errors.New" || fn == "fmt.Errorf" {
			return "error", nil
		}
	}
	for _, n := range s.Names {
		if n.IsExported() {
			return "", fmt.Errorf("exported var %s: give it an explicit type so the API listing can name it", n.Name)
		}
	}
	return "", nil
}

func (w *writer) typeSpec(s *ast.TypeSpec) {
	if !s.Name.IsExported() {
		return
	}
	name := s.Name.Name + w.typeParams(s.TypeParams)
	switch t := s.Type.(type) {
	case *ast.StructType:
		w.add("type %s struct", name)
		for _, f := range t.Fields.List {
			for _, n := range f.Names {
				if n.IsExported() {
					w.add("type %s struct, %s %s", name, n.Name, w.expr(f.Type))
				}
			}
			if len(f.Names) == 0 { // embedded
				w.add("type %s struct, embedded %s", name, w.expr(f.Type))
			}
		}
	case *ast.InterfaceType:
		w.add("type %s interface", name)
		for _, m := range t.Methods.List {
			for _, n := range m.Names {
				if ft, ok := m.Type.(*ast.FuncType); ok {
					w.add("type %s interface, %s%s", name, n.Name, w.signature(ft))
				}
			}
			if len(m.Names) == 0 {
				w.add("type %s interface, embedded %s", name, w.expr(m.Type))
			}
		}
	default:
		eq := " "
		if s.Assign.IsValid() {
			eq = " = "
		}
		w.add("type %s%s%s", name, eq, w.expr(s.Type))
	}
}
