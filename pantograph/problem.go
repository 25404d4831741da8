package pantograph

import (
	"fmt"

	"panto/internal/numfmt"
)

// Severity says whether a problem makes a part unfit to cut.
type Severity string

// The severities of a Problem.
const (
	Error   Severity = "error"   // the part cannot be cut as written; the file is bad
	Warning Severity = "warning" // the part can be cut, but something will come out weak or odd
)

// Problem is one thing found wrong with a part (by Check) or with a plan (by PlanPart): what
// is wrong, with which feature, where it was written and, when it has one, how much.
type Problem struct {
	Severity Severity
	Feature  string // the feature's name as plans list it, e.g. "ports"; empty for the whole
	Label    string // the feature's label, e.g. `[[holes]] "ports"`; empty for the whole
	Message  string // what is wrong, in a machinist's words
	// Amount is the size of the trouble in mm at the part (how far outside, how much overlap,
	// how thin, how much material is left), when HasAmount is true.
	Amount    float64
	HasAmount bool
	Where     Where
	// Stops is true for a plan's problem that no acceptance gets round: the template does not
	// fit the copy table, the ratio cannot be set.
	Stops bool
}

// Diagnostic formats the problem the way a compiler would: place, severity, feature, message.
func (p Problem) Diagnostic() string {
	s := string(p.Severity) + ": "
	if w := p.Where.String(); w != "" {
		s = w + ": " + s
	}
	if p.Label != "" {
		s += p.Label + ": "
	}
	return s + p.Message
}

// String gives the feature's label and the message, as lists of warnings print them.
func (p Problem) String() string {
	if p.Label == "" {
		return p.Message
	}
	return p.Label + ": " + p.Message
}

// HasErrors reports whether any problem is an error.
func HasErrors(ps []Problem) bool {
	for _, p := range ps {
		if p.Severity == Error {
			return true
		}
	}
	return false
}

// problemf builds a problem about feature f without an amount.
func problemf(sev Severity, f Feature, format string, args ...any) Problem {
	return Problem{Severity: sev, Feature: featureName(f), Label: f.Label(),
		Message: fmt.Sprintf(format, args...), Where: f.Where}
}

// on moves the problem to the line of key in feature f.
func (p Problem) on(f Feature, key string) Problem {
	p.Where = f.WhereKey(key)
	return p
}

// amountf builds a problem about feature f with an amount in mm.
func amountf(sev Severity, f Feature, amount float64, format string, args ...any) Problem {
	p := problemf(sev, f, format, args...)
	p.Amount, p.HasAmount = amount, true
	return p
}

// mm formats a length for messages: to the micrometre, without trailing zeros.
func mm(v float64) string {
	return fmt.Sprintf("%s mm", num(v))
}

// num formats a length for messages, as numfmt.MM does.
func num(v float64) string { return numfmt.MM(v) }

// pt formats a point for messages.
func pt(x, y float64) string { return numfmt.Point(x, y) }
