// Package severity is the one definition of how serious a caution is:
// the order NOTE < CAUTION < WARNING, the words printed for them and
// what each means. It is a leaf shared by the engine (calc/trace names
// it trace.Severity), the sheet model (a "> [!WORD]" caution in prose)
// and the layout (the caution box), so that none of them needs another's
// types to agree on it.
package severity
