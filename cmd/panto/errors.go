package main

import (
	"errors"
	"fmt"
	"io"
	"io/fs"
)

// exitError is why a command stopped: what to tell the machinist and the exit code. Commands
// return it; run prints it once, on standard error.
type exitError struct {
	code int
	msg  string
}

func (e *exitError) Error() string { return e.msg }

// usagef is bad usage or bad input (exit 2), said as "panto CMD: ...".
func usagef(cmd, format string, args ...any) error {
	return &exitError{exitUsage, "panto " + cmd + ": " + fmt.Sprintf(format, args...)}
}

// failf is a job that could not be done (exit 1), said as "panto CMD: ...".
func failf(cmd, format string, args ...any) error {
	return &exitError{exitFailed, "panto " + cmd + ": " + fmt.Sprintf(format, args...)}
}

// badFile is a file that could not be read (exit 2). A file that cannot be opened is named with
// the command and what it was meant to be; a bad file's own error already names file and line
// and is said as it is.
func badFile(cmd, what string, err error) error {
	var pe *fs.PathError
	if errors.As(err, &pe) {
		return usagef(cmd, "cannot read the %s: %v", what, err)
	}
	return &exitError{exitUsage, err.Error()}
}

// exitCode prints err, if any, and returns the exit code it carries: 0 for none, 1 for an
// error that is not an exitError (a write to standard output failing, say).
func exitCode(err error, stderr io.Writer) int {
	if err == nil {
		return exitOK
	}
	var e *exitError
	if errors.As(err, &e) {
		if e.msg != "" {
			fmt.Fprintln(stderr, e.msg)
		}
		return e.code
	}
	fmt.Fprintf(stderr, "panto: %v\n", err)
	return exitFailed
}

// warn prints warnings on standard error, each on its own line.
func warn(stderr io.Writer, prefix string, ws []string) {
	for _, w := range ws {
		fmt.Fprintf(stderr, "%s%s\n", prefix, w)
	}
}
