package sarif

// LevelError is SARIF's level of a definite finding (§3.27.10), which
// the tests give their rules.
const LevelError = "error"

// Log returns the log built so far.
func (b *Builder) Log() *Log { return &b.log }
