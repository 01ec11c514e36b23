package sheet

import "github.com/plinth-calc/plinth/doc/source"

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

	// Design basis (printed on the summary page; a missing one prints
	// "not stated" and is an open item).
	Standard    Str // the design standard in force ("EN 1997-1:2004")
	GeoCategory Str // Geotechnical Category (EN 1997-1 2.1)
	DesignLife  Str // design working life ("50 years")
	Consequence Str // consequence class (EN 1990 Annex B)
	Exclusions  Str // what the package does not cover
	Detail      Str // how much working the sheets print: governing (default) or full
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
		"standard", "geotechnical_category", "design_life", "consequence_class", "exclusions", "detail",
	}
	SheetOnly = []string{"uses"}

	// RevisionKeys are the keys of one revisions entry.
	RevisionKeys = []string{"rev", "date", "by", "checked", "note"}

	// Details are the words the detail field takes (the first is the default).
	Details = []string{"governing", "full"}

	// Templates are the built-in page templates a template field may name.
	Templates = []string{"a4", "letter"}
)

// key returns the key as written and true when the field was set.
func (m *Meta) key(name string) (Str, bool) {
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
	case "standard":
		return &m.Standard
	case "geotechnical_category":
		return &m.GeoCategory
	case "design_life":
		return &m.DesignLife
	case "consequence_class":
		return &m.Consequence
	case "exclusions":
		return &m.Exclusions
	case "detail":
		return &m.Detail
	}
	return nil
}

// has reports whether the field was set.
func (m *Meta) has(name string) bool {
	_, ok := m.key(name)
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

// merge returns the settings in force when over (a sheet's front matter) is
// laid on defaults (package.yaml): each field set in over wins; references
// are merged by key (over's text wins, new keys follow the defaults' in
// over's order); revisions are replaced when over sets them; uses is
// over's alone. Keys lists defaults' keys then over's new ones.
func merge(defaults, over *Meta) Meta {
	m := *defaults
	m.Span = over.Span
	m.Keys = append([]Str(nil), defaults.Keys...)
	for _, k := range over.Keys {
		if !defaults.has(k.Value) {
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
	str(&m.Standard, over.Standard)
	str(&m.GeoCategory, over.GeoCategory)
	str(&m.DesignLife, over.DesignLife)
	str(&m.Consequence, over.Consequence)
	str(&m.Exclusions, over.Exclusions)
	str(&m.Detail, over.Detail)
	m.Uses = over.Uses
	if over.has("revisions") {
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
