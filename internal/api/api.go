// Package api lists the exported API of hydrosize, one line per identifier,
// in the spirit of Go's api/go1.*.txt files. The committed listing
// (api.txt) and its test keep the API a promise: see api_test.go and
// DEVELOPERS.md.
//
// The listing is built from type information (go/types, with the standard
// library's source importer), not from the syntax: each exported identifier
// is listed with its real type, a constant with its type and value, and an
// alias of an internal type (units.RangeError) with the fields and methods a
// caller sees. This is format 2 of the listing; format 1 (before it) was read
// from the syntax and wrote "untyped" for a constant without an explicit type
// and no value.
package api

import (
	"fmt"
	"go/build"
	"go/constant"
	"go/importer"
	"go/token"
	"go/types"
	"io/fs"
	"path"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
)

// Module is the module path that prefixes package paths in the listing.
const Module = "github.com/hydrosize/hydrosize"

// Lines returns the exported API of every public package under root (the
// module root), sorted. Packages under internal/ and examples/, main
// packages, test files and files excluded by build constraints (such as a
// "//go:build ignore" generator) are left out.
func Lines(root string) ([]string, error) {
	dirs, err := packageDirs(root)
	if err != nil {
		return nil, err
	}
	imp, ok := importer.ForCompiler(token.NewFileSet(), "source", nil).(types.ImporterFrom)
	if !ok {
		return nil, fmt.Errorf("api: the source importer cannot import from a directory")
	}
	var out []string
	for _, dir := range dirs {
		pkgPath := Module
		if dir != "." {
			pkgPath += "/" + dir
		}
		pkg, err := imp.ImportFrom(pkgPath, root, 0)
		if err != nil {
			return nil, fmt.Errorf("api: %s: %w", pkgPath, err)
		}
		if pkg.Name() == "main" {
			continue
		}
		out = append(out, packageLines(pkg)...)
	}
	sort.Strings(out)
	return out, nil
}

// packageDirs returns the module-relative directories under root that hold
// the non-test Go files of a public package.
func packageDirs(root string) ([]string, error) {
	seen := map[string]bool{}
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
			if ok, err := build.Default.MatchFile(filepath.Dir(p), d.Name()); err == nil && ok {
				seen[path.Dir(rel)] = true
			}
		}
		return nil
	})
	dirs := make([]string, 0, len(seen))
	for d := range seen {
		dirs = append(dirs, d)
	}
	sort.Strings(dirs)
	return dirs, err
}

// lister writes the lines of one package.
type lister struct {
	pkg   *types.Package
	lines []string
}

func packageLines(pkg *types.Package) []string {
	l := &lister{pkg: pkg}
	scope := pkg.Scope()
	for _, name := range scope.Names() {
		if obj := scope.Lookup(name); obj.Exported() {
			l.object(obj)
		}
	}
	return l.lines
}

func (l *lister) add(format string, args ...any) {
	l.lines = append(l.lines, "pkg "+l.pkg.Path()+", "+fmt.Sprintf(format, args...))
}

// qualify names a package as its source does: nothing for this package,
// the package name for any other.
func (l *lister) qualify(p *types.Package) string {
	if p == l.pkg {
		return ""
	}
	return p.Name()
}

func (l *lister) typ(t types.Type) string { return types.TypeString(t, l.qualify) }

func (l *lister) object(obj types.Object) {
	switch o := obj.(type) {
	case *types.Const:
		l.add("const %s %s = %s", o.Name(), l.typ(o.Type()), constValue(o))
	case *types.Var:
		l.add("var %s %s", o.Name(), l.typ(o.Type()))
	case *types.Func:
		sig := o.Type().(*types.Signature)
		l.add("func %s%s%s", o.Name(), l.typeParams(sig.TypeParams()), l.signature(sig))
	case *types.TypeName:
		l.typeName(o)
	}
}

// constValue writes a constant's value: a float as the float64 a program
// gets (shortest decimal that reads back), an integer exactly, a string
// quoted.
func constValue(c *types.Const) string {
	v := c.Val()
	switch v.Kind() {
	case constant.Float:
		f, _ := constant.Float64Val(v)
		return strconv.FormatFloat(f, 'g', -1, 64)
	case constant.String:
		return strconv.Quote(constant.StringVal(v))
	}
	return v.ExactString()
}

func (l *lister) typeParams(tp *types.TypeParamList) string {
	if tp == nil || tp.Len() == 0 {
		return ""
	}
	parts := make([]string, tp.Len())
	for i := range tp.Len() {
		p := tp.At(i)
		parts[i] = p.Obj().Name() + " " + l.typ(p.Constraint())
	}
	return "[" + strings.Join(parts, ", ") + "]"
}

// signature writes a function type without parameter names:
// "(string, ...any) (T, error)".
func (l *lister) signature(sig *types.Signature) string {
	params := l.tuple(sig.Params(), sig.Variadic())
	res := sig.Results()
	switch res.Len() {
	case 0:
		return "(" + params + ")"
	case 1:
		return "(" + params + ") " + l.typ(res.At(0).Type())
	}
	return "(" + params + ") (" + l.tuple(res, false) + ")"
}

func (l *lister) tuple(t *types.Tuple, variadic bool) string {
	parts := make([]string, t.Len())
	for i := range t.Len() {
		typ := t.At(i).Type()
		if variadic && i == t.Len()-1 {
			parts[i] = "..." + l.typ(typ.(*types.Slice).Elem())
			continue
		}
		parts[i] = l.typ(typ)
	}
	return strings.Join(parts, ", ")
}

func (l *lister) typeName(o *types.TypeName) {
	if o.IsAlias() {
		named, ok := types.Unalias(o.Type()).(*types.Named)
		if !ok || !internalPackage(named.Obj().Pkg()) {
			l.add("type %s = %s", o.Name(), l.typ(types.Unalias(o.Type())))
			return
		}
		// An alias of an internal type is listed as the type a caller
		// sees under this name: its fields and its methods.
		l.named(o.Name(), named)
		return
	}
	named, ok := o.Type().(*types.Named)
	if !ok {
		return
	}
	l.named(o.Name()+l.typeParams(named.TypeParams()), named)
}

// internalPackage reports whether p is under an internal/ directory.
func internalPackage(p *types.Package) bool {
	return p != nil && (strings.Contains(p.Path(), "/internal/") || strings.HasSuffix(p.Path(), "/internal"))
}

// named lists type name (with its type parameters) of named type t: its
// underlying type, exported fields or interface methods, and its declared
// methods.
func (l *lister) named(name string, t *types.Named) {
	switch u := t.Underlying().(type) {
	case *types.Struct:
		l.add("type %s struct", name)
		for i := range u.NumFields() {
			f := u.Field(i)
			switch {
			case f.Embedded():
				l.add("type %s struct, embedded %s", name, l.typ(f.Type()))
			case f.Exported():
				l.add("type %s struct, %s %s", name, f.Name(), l.typ(f.Type()))
			}
		}
	case *types.Interface:
		l.add("type %s interface", name)
		for i := range u.NumEmbeddeds() {
			l.add("type %s interface, embedded %s", name, l.typ(u.EmbeddedType(i)))
		}
		for i := range u.NumExplicitMethods() {
			m := u.ExplicitMethod(i)
			if m.Exported() {
				l.add("type %s interface, %s%s", name, m.Name(), l.signature(m.Type().(*types.Signature)))
			}
		}
	default:
		l.add("type %s %s", name, l.typ(u))
	}
	recvName := name
	if i := strings.IndexByte(name, '['); i >= 0 {
		recvName = name[:i] + typeArgNames(t)
	}
	for i := range t.NumMethods() {
		m := t.Method(i)
		if !m.Exported() {
			continue
		}
		sig := m.Type().(*types.Signature)
		recv := recvName
		if _, ptr := sig.Recv().Type().(*types.Pointer); ptr {
			recv = "*" + recv
		}
		l.add("method (%s) %s%s", recv, m.Name(), l.signature(sig))
	}
}

// typeArgNames writes the type parameters of t as a receiver names them:
// "[T]", "[K, V]".
func typeArgNames(t *types.Named) string {
	tp := t.TypeParams()
	names := make([]string, tp.Len())
	for i := range tp.Len() {
		names[i] = tp.At(i).Obj().Name()
	}
	return "[" + strings.Join(names, ", ") + "]"
}
