package sheet

// Merge lays a sheet's settings on the package's, for the tests.
var Merge = merge
