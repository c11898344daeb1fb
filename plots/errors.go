package plots

import "errors"

// ErrNotFinite reports a NaN or infinite number in chart data.
var ErrNotFinite = errors.New("plots: value is not a finite number")

// ErrNotIncreasing reports a line whose points do not run in non-decreasing X order.
var ErrNotIncreasing = errors.New("plots: points must be in non-decreasing X order")

// ErrBadRange reports an axis range whose minimum is not below its maximum.
var ErrBadRange = errors.New("plots: range minimum must be less than its maximum")

// ErrBadSize reports an output size that is zero, negative or absurdly large.
var ErrBadSize = errors.New("plots: output size out of range")

// ErrUnknownFormat reports an export format other than PNG, SVG or PDF.
var ErrUnknownFormat = errors.New("plots: unknown export format (want .png, .svg or .pdf)")

// ErrNoChart reports a nil *Chart handed to a drawing function.
var ErrNoChart = errors.New("plots: no chart given (nil *Chart)")
