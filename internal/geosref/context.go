//go:build reference

package geosref

/*
#cgo LDFLAGS: -lgeos_c
#include <stdlib.h>
#include <string.h>
#include <geos_c.h>

// errBufLen is the size of the buffer that keeps a context's last error message.
enum { errBufLen = 512 };

// keepError stores GEOS's error message in the buffer handed over as user data, so that the
// Go side can read it after a call fails.
static void keepError(const char *msg, void *userdata) {
	char *buf = (char *)userdata;
	strncpy(buf, msg, errBufLen - 1);
	buf[errBufLen - 1] = 0;
}

static GEOSContextHandle_t openContext(char *buf) {
	GEOSContextHandle_t h = GEOS_init_r();
	if (h != NULL) {
		GEOSContext_setErrorMessageHandler_r(h, keepError, buf);
	}
	return h;
}
*/
import "C"

import (
	"errors"
	"fmt"
	"unsafe"
)

// context is one GEOS context and the buffer its error handler writes to.
type context struct {
	h   C.GEOSContextHandle_t
	msg *C.char
}

// open starts a GEOS context; close must be called when done with it.
func open() (*context, error) {
	msg := (*C.char)(C.calloc(C.errBufLen, 1))
	if msg == nil {
		return nil, errors.New("geosref: out of memory")
	}
	h := C.openContext(msg)
	if h == nil {
		C.free(unsafe.Pointer(msg))
		return nil, errors.New("geosref: GEOS_init_r failed")
	}
	return &context{h: h, msg: msg}, nil
}

// close frees the context and its error buffer.
func (c *context) close() {
	C.finishGEOS_r(c.h)
	C.free(unsafe.Pointer(c.msg))
}

// fail returns an error for a failed GEOS call, with the message GEOS left behind.
func (c *context) fail(op string) error {
	m := C.GoString(c.msg)
	if m == "" {
		m = "failed without a message"
	}
	return fmt.Errorf("geosref: %s: %s", op, m)
}

// free destroys a geometry this package owns; nil is ignored.
func (c *context) free(g *C.GEOSGeometry) {
	if g != nil {
		C.GEOSGeom_destroy_r(c.h, g)
	}
}

// with runs f on a fresh context and closes it afterwards.
func with[T any](f func(c *context) (T, error)) (T, error) {
	c, err := open()
	if err != nil {
		var zero T
		return zero, err
	}
	defer c.close()
	return f(c)
}

// Version returns the version of the GEOS library linked in.
func Version() string { return C.GoString(C.GEOSversion()) }
