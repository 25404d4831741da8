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

// Problem is one thing Check found wrong with a part.
type Problem struct {
	Severity Severity
	Feature  string // the feature's label, e.g. `[[holes]] "ports"`; empty for the whole part
	Message  string // what is wrong, in a machinist's words
	// Amount is the size of the trouble in mm (how far outside, how much overlap, how thin),
	// when HasAmount is true.
	Amount    float64
	HasAmount bool
	Where     Where
}

// Error formats the problem the way a compiler would: place, severity, feature, message.
func (p Problem) Error() string {
	s := string(p.Severity) + ": "
	if w := p.Where.String(); w != "" {
		s = w + ": " + s
	}
	if p.Feature != "" {
		s += p.Feature + ": "
	}
	return s + p.Message
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
	return Problem{Severity: sev, Feature: f.Label(), Message: fmt.Sprintf(format, args...),
		Where: f.Where}
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
