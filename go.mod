module github.com/hydrosize/hydrosize

go 1.26
