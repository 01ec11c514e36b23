package sheet

import "plinth/doc/source"

// Meta holds the fields of a sheet's front matter or of package.yaml. Every
// field keeps its span; an absent field has a zero span (see Str.IsSet).
// Dates, initials and revision names are kept as written.
type Meta struct {
	Span source.Span // the YAML text (zero when there is none)
	Keys []Str       // the keys as written, in order

	// Sheet fields (package.yaml may set them as defaults, except uses).
	Title       Str   // sheet title
	Calc        Str   // calc number
	By          Str   // designer's initials
	Date        Str   // date of the calculation
	Checked     Str   // checker's initials (blank = not yet checked)
	CheckedDate Str   // date of the check
	Revision    Str   // the sheet's current revision ("P2")
	Uses        []Str // sheets of the same package whose symbols this sheet reads

	// Package fields (a sheet may override them).
	Project       Str
	Job           Str
	Client        Str
	Template      Str // built-in page template (a4, letter) or a path inside the package
	Revisions     []Revision
	References    []Reference // in the order written
	NationalAnnex Str         // the national annex in force, as printed ("UK NA to BS EN 1997-1")
	Factors       Str         // path inside the package to a partial-factor data file
}

// Revision is one entry of revisions.
type Revision struct {
	Span    source.Span
	Rev     Str
	Date    Str
	By      Str
	Checked Str
	Note    Str
}

// Reference is one entry of references: a key cited as [KEY] and the
// citation printed in the references list.
type Reference struct {
	Key  Str
	Text Str
}

// Front-matter keys, as data: MetaKeys lists every key in the order the
// documentation gives them; SheetOnly the ones package.yaml may not set.
var (
	MetaKeys = []string{
		"title", "calc", "by", "date", "checked", "checked_date", "uses", "revision",
		"project", "job", "client", "template", "revisions", "references",
		"national_annex", "factors",
	}
	SheetOnly = []string{"uses"}

	// RevisionKeys are the keys of one revisions entry.
	RevisionKeys = []string{"rev", "date", "by", "checked", "note"}

	// Templates are the built-in page templates a template field may name.
	Templates = []string{"a4", "letter"}
)

// Key returns the key as written and true when the field was set.
func (m *Meta) Key(name string) (Str, bool) {
	for _, k := range m.Keys {
		if k.Value == name {
			return k, true
		}
	}
	return Str{}, false
}

// Field returns the text-valued field for a key (see MetaKeys), or nil
// for uses, revisions, references and unknown keys.
func (m *Meta) Field(key string) *Str {
	switch key {
	case "title":
		return &m.Title
	case "calc":
		return &m.Calc
	case "by":
		return &m.By
	case "date":
		return &m.Date
	case "checked":
		return &m.Checked
	case "checked_date":
		return &m.CheckedDate
	case "revision":
		return &m.Revision
	case "project":
		return &m.Project
	case "job":
		return &m.Job
	case "client":
		return &m.Client
	case "template":
		return &m.Template
	case "national_annex":
		return &m.NationalAnnex
	case "factors":
		return &m.Factors
	}
	return nil
}

// Has reports whether the field was set.
func (m *Meta) Has(name string) bool {
	_, ok := m.Key(name)
	return ok
}

// Reference returns the reference with the given key.
func (m *Meta) Reference(key string) (Reference, bool) {
	for _, r := range m.References {
		if r.Key.Value == key {
			return r, true
		}
	}
	return Reference{}, false
}

// Merge returns the settings in force when over (a sheet's front matter) is
// laid on defaults (package.yaml): each field set in over wins; references
// are merged by key (over's text wins, new keys follow the defaults' in
// over's order); revisions are replaced when over sets them; uses is
// over's alone. Keys lists defaults' keys then over's new ones.
func Merge(defaults, over *Meta) Meta {
	m := *defaults
	m.Span = over.Span
	m.Keys = append([]Str(nil), defaults.Keys...)
	for _, k := range over.Keys {
		if !defaults.Has(k.Value) {
			m.Keys = append(m.Keys, k)
		}
	}
	str := func(d *Str, o Str) {
		if o.IsSet() {
			*d = o
		}
	}
	str(&m.Title, over.Title)
	str(&m.Calc, over.Calc)
	str(&m.By, over.By)
	str(&m.Date, over.Date)
	str(&m.Checked, over.Checked)
	str(&m.CheckedDate, over.CheckedDate)
	str(&m.Revision, over.Revision)
	str(&m.Project, over.Project)
	str(&m.Job, over.Job)
	str(&m.Client, over.Client)
	str(&m.Template, over.Template)
	str(&m.NationalAnnex, over.NationalAnnex)
	str(&m.Factors, over.Factors)
	m.Uses = over.Uses
	if over.Has("revisions") {
		m.Revisions = over.Revisions
	}
	if len(over.References) > 0 {
		refs := append([]Reference(nil), defaults.References...)
		for _, r := range over.References {
			i := 0
			for i < len(refs) && refs[i].Key.Value != r.Key.Value {
				i++
			}
			if i < len(refs) {
				refs[i] = r
			} else {
				refs = append(refs, r)
			}
		}
		m.References = refs
	}
	return m
}
