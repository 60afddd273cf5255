package hydro

import (
	"strconv"
	"strings"
)

// writeText lays a document out as plain text: a ruled title, numbered
// sections, aligned key–value lines with their rules in brackets, padded
// tables with their notes, and findings as an indented list.
func writeText(d doc) string {
	var b strings.Builder
	b.WriteString(d.title)
	b.WriteByte('\n')
	b.WriteString(strings.Repeat("=", width(d.title)))
	b.WriteString("\n")
	for i, s := range d.sections {
		head := strconv.Itoa(i+1) + ". " + s.title
		b.WriteString("\n" + head + "\n" + strings.Repeat("-", width(head)) + "\n")
		for _, bl := range s.blocks {
			textBlock(&b, bl)
		}
	}
	return b.String()
}

func textBlock(b *strings.Builder, bl block) {
	switch {
	case bl.text != "":
		b.WriteString(wrap(bl.text, 78, "", ""))
	case len(bl.pairs) > 0:
		w := 0
		for _, p := range bl.pairs {
			w = max(w, width(p[0]))
		}
		for _, p := range bl.pairs {
			b.WriteString("  " + pad(p[0], w) + "  " + p[1])
			if p[2] != "" {
				b.WriteString("  [" + p[2] + "]")
			}
			b.WriteByte('\n')
		}
	case len(bl.items) > 0:
		for _, it := range bl.items {
			b.WriteString(wrap(it[0]+": "+it[1], 78, "  * ", "    "))
			if it[2] != "" {
				b.WriteString(wrap("["+it[2]+"]", 78, "    ", "     "))
			}
		}
	case len(bl.head) > 0:
		textTable(b, bl)
	}
}

func textTable(b *strings.Builder, bl block) {
	w := make([]int, len(bl.head))
	for i, h := range bl.head {
		w[i] = width(h)
	}
	for _, r := range bl.rows {
		for i, c := range r {
			w[i] = max(w[i], width(c))
		}
	}
	line := func(cells []string) {
		var l strings.Builder
		l.WriteString(" ")
		for i, c := range cells {
			l.WriteString(" " + pad(c, w[i]))
		}
		b.WriteString(strings.TrimRight(l.String(), " ") + "\n")
	}
	line(bl.head)
	rule := make([]string, len(w))
	for i := range w {
		rule[i] = strings.Repeat("-", w[i])
	}
	line(rule)
	for _, r := range bl.rows {
		line(r)
	}
	for _, n := range bl.notes {
		b.WriteString(wrap("("+n+")", 78, "  ", "   "))
	}
}

// pad right-pads s with spaces to w runes.
func pad(s string, w int) string { return s + strings.Repeat(" ", max(w-width(s), 0)) }

// wrap breaks text into lines of at most n runes at spaces, the first line
// starting with first and the others with indent; it ends with a newline.
func wrap(text string, n int, first, indent string) string {
	var b strings.Builder
	b.WriteString(first)
	col := width(first)
	for i, word := range strings.Fields(text) {
		if i > 0 && col+1+width(word) > n {
			b.WriteString("\n" + indent)
			col = width(indent)
		} else if i > 0 {
			b.WriteByte(' ')
			col++
		}
		b.WriteString(word)
		col += width(word)
	}
	b.WriteByte('\n')
	return b.String()
}

// writeMarkdown lays a document out as Markdown: a level-1 title, level-2
// sections, key–value lists as two-column tables, tables as pipe tables,
// notes in italics and findings as a bulleted list.
func writeMarkdown(d doc) string {
	var b strings.Builder
	b.WriteString("# " + md(d.title) + "\n")
	for _, s := range d.sections {
		b.WriteString("\n## " + md(s.title) + "\n")
		for _, bl := range s.blocks {
			b.WriteByte('\n')
			mdBlock(&b, bl)
		}
	}
	return b.String()
}

func mdBlock(b *strings.Builder, bl block) {
	switch {
	case bl.text != "":
		b.WriteString(md(bl.text) + "\n")
	case len(bl.pairs) > 0:
		b.WriteString("| | | rule |\n|---|---|---|\n")
		for _, p := range bl.pairs {
			b.WriteString("| " + md(p[0]) + " | " + md(p[1]) + " | " + md(p[2]) + " |\n")
		}
	case len(bl.items) > 0:
		for _, it := range bl.items {
			b.WriteString("- **" + md(it[0]) + "** " + md(it[1]))
			if it[2] != "" {
				b.WriteString(" *(" + md(it[2]) + ")*")
			}
			b.WriteByte('\n')
		}
	case len(bl.head) > 0:
		b.WriteString("| " + strings.Join(mdAll(bl.head), " | ") + " |\n|")
		b.WriteString(strings.Repeat("---|", len(bl.head)) + "\n")
		for _, r := range bl.rows {
			b.WriteString("| " + strings.Join(mdAll(r), " | ") + " |\n")
		}
		for _, n := range bl.notes {
			b.WriteString("\n*" + md(n) + "*\n")
		}
	}
}

// md escapes the characters Markdown would read as markup.
func md(s string) string {
	r := strings.NewReplacer("|", "\\|", "*", "\\*", "_", "\\_", "`", "\\`", "[", "\\[", "]", "\\]", "<", "&lt;")
	return r.Replace(s)
}

func mdAll(cells []string) []string {
	out := make([]string, len(cells))
	for i, c := range cells {
		out[i] = md(c)
	}
	return out
}
