module github.com/hydrosize/hydrosize

go 1.26

require gonum.org/v1/gonum v0.17.0

require github.com/google/go-cmp v0.7.0
