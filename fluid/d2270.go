package fluid

//go:generate go run gen_d2270.go

// d2270Row is one row of ASTM D2270 Table 1, all in mm²/s.
type d2270Row struct{ y, l, h float64 }
