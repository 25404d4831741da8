package main

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"panto/pantograph"
)

// This file reads lengths given on the command line: a number with an optional unit, "mm" or
// "in", written after it with or without a space, and fractions such as 1/32 for the inch
// sizes tools are sold in: "0.5", "0.5mm", "1/32in", "0.03125 in", "3/64". A plain number
// keeps the flag's own unit (mm for tool sizes, stock and kerf; the part's units for --datum).

// length is a length read from a flag: its value and the unit it was given in, "" when none.
type length struct {
	value float64
	unit  pantograph.Units
}

// mm returns the length in mm, a plain number taken in plain.
func (l length) mm(plain pantograph.Units) float64 {
	u := l.unit
	if u == "" {
		u = plain
	}
	if u == pantograph.Inch {
		return l.value * pantograph.MMPerInch
	}
	return l.value
}

// parseLength reads one length.
func parseLength(s string) (length, error) {
	t := strings.TrimSpace(s)
	var l length
	for _, u := range []pantograph.Units{pantograph.MM, pantograph.Inch} {
		if rest, ok := strings.CutSuffix(t, string(u)); ok {
			t, l.unit = strings.TrimSpace(rest), u
			break
		}
	}
	v, err := parseNumber(t)
	if err != nil {
		return length{}, fmt.Errorf("%q is not a length: write a number, a fraction such as 1/32, and mm or in if not the default", s)
	}
	l.value = v
	return l, nil
}

// parseNumber reads a decimal number or a fraction a/b; it refuses what is not finite.
func parseNumber(s string) (float64, error) {
	num, den, frac := strings.Cut(s, "/")
	v, err := strconv.ParseFloat(strings.TrimSpace(num), 64)
	if err == nil && frac {
		var d float64
		if d, err = strconv.ParseFloat(strings.TrimSpace(den), 64); err == nil {
			if d == 0 {
				return 0, fmt.Errorf("a fraction over 0")
			}
			v /= d
		}
	}
	if err == nil && (math.IsNaN(v) || math.IsInf(v, 0)) {
		err = fmt.Errorf("not finite")
	}
	return v, err
}

// lengthFlag is a pflag.Value holding one length.
type lengthFlag struct{ l length }

func (f *lengthFlag) String() string {
	if f.l.unit == "" {
		return strconv.FormatFloat(f.l.value, 'g', -1, 64)
	}
	return strconv.FormatFloat(f.l.value, 'g', -1, 64) + string(f.l.unit)
}

func (f *lengthFlag) Set(s string) error {
	l, err := parseLength(s)
	if err == nil {
		f.l = l
	}
	return err
}

func (f *lengthFlag) Type() string { return "length" }

// pointFlag is a pflag.Value holding X,Y, two lengths.
type pointFlag struct {
	x, y length
	set  bool
}

func (f *pointFlag) String() string {
	if !f.set {
		return ""
	}
	return fmt.Sprintf("%g%s,%g%s", f.x.value, f.x.unit, f.y.value, f.y.unit)
}

func (f *pointFlag) Set(s string) error {
	a, b, ok := strings.Cut(s, ",")
	if !ok {
		return fmt.Errorf("takes two lengths, X,Y; got %q", s)
	}
	x, err := parseLength(a)
	if err != nil {
		return err
	}
	y, err := parseLength(b)
	if err != nil {
		return err
	}
	f.x, f.y, f.set = x, y, true
	return nil
}

func (f *pointFlag) Type() string { return "x,y" }
