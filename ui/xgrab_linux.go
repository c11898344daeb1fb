//go:build linux && !android && cgo

package ui

/*
#cgo LDFLAGS: -lX11
#include <X11/Xlib.h>
#include <X11/Xutil.h>

static int shift(unsigned long mask) {
	int s = 0;
	if (mask == 0) return 0;
	while ((mask & 1) == 0) { mask >>= 1; s++; }
	return s;
}

// grab copies the w×h top-left corner of the X screen into out as RGBA.
static int grab(int w, int h, unsigned char *out) {
	Display *d = XOpenDisplay(NULL);
	if (!d) return 1;
	XImage *img = XGetImage(d, DefaultRootWindow(d), 0, 0, w, h, AllPlanes, ZPixmap);
	if (!img) { XCloseDisplay(d); return 2; }
	int rs = shift(img->red_mask), gs = shift(img->green_mask), bs = shift(img->blue_mask);
	for (int y = 0; y < h; y++) {
		for (int x = 0; x < w; x++) {
			unsigned long p = XGetPixel(img, x, y);
			unsigned char *o = out + 4 * (y * w + x);
			o[0] = (p & img->red_mask) >> rs;
			o[1] = (p & img->green_mask) >> gs;
			o[2] = (p & img->blue_mask) >> bs;
			o[3] = 255;
		}
	}
	XDestroyImage(img);
	XCloseDisplay(d);
	return 0;
}
*/
import "C"

import (
	"fmt"
	"image"
	"unsafe"
)

// grabScreen reads the top-left w×h pixels of the X screen, where the window
// sits when it fills a screen with no window manager (Xvfb): the pixels as
// shown, read back from the X server.
func grabScreen(w, h int) (image.Image, error) {
	if w <= 0 || h <= 0 {
		return nil, fmt.Errorf("screen grab of %dx%d pixels", w, h)
	}
	img := image.NewRGBA(image.Rect(0, 0, w, h))
	if rc := C.grab(C.int(w), C.int(h), (*C.uchar)(unsafe.Pointer(&img.Pix[0]))); rc != 0 {
		return nil, fmt.Errorf("X screen could not be read (code %d)", int(rc))
	}
	return img, nil
}
