package cad

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"

	"panto/pantograph"
)

// IsDrawing reports whether path names a drawing this package reads, by its extension.
func IsDrawing(path string) bool {
	switch strings.ToLower(filepath.Ext(path)) {
	case ".dxf", ".svg":
		return true
	}
	return false
}

// ReadFile reads the DXF or SVG drawing at path (chosen by extension) and classifies it into a
// part; messages name the file as path.
func ReadFile(path string, opts Options) (pantograph.Part, Report, error) {
	src, err := os.ReadFile(path)
	if err != nil {
		return pantograph.Part{}, Report{File: path}, err
	}
	return Read(path, src, opts)
}

// Read reads a drawing from src; name, used in messages, chooses the format by its extension.
func Read(name string, src []byte, opts Options) (pantograph.Part, Report, error) {
	var sh *Drawing
	var err error
	switch ext := strings.ToLower(filepath.Ext(name)); ext {
	case ".dxf":
		sh, err = ReadDXF(name, src, opts)
	case ".svg":
		sh, err = ReadSVG(name, src, opts)
	default:
		return pantograph.Part{}, Report{File: name}, &Error{File: name,
			Msg: fmt.Sprintf("%q is not a drawing panto reads: give a .dxf or .svg file", ext)}
	}
	if err != nil {
		return pantograph.Part{}, Report{File: name}, err
	}
	return Classify(sh, opts)
}
