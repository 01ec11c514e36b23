package layout

// ParseLength reads a template length, for the template tests.
var ParseLength = parseLength
