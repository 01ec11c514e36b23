module github.com/plinth-calc/plinth

go 1.26.0

require (
	github.com/Knetic/govaluate v3.0.0+incompatible
	github.com/fsnotify/fsnotify v1.10.1
	github.com/go-fonts/dejavu v0.3.2
	github.com/signintech/gopdf v0.38.1
	github.com/yuin/goldmark v1.8.7
	go.yaml.in/yaml/v3 v3.0.6
	golang.org/x/image v0.48.0
	gonum.org/v1/gonum v0.17.0
)

require (
	github.com/klauspost/compress v1.20.4 // indirect
	github.com/phpdave11/gofpdi v1.0.14-0.20211212211723-1f10f9844311 // indirect
	github.com/pkg/errors v0.8.1 // indirect
	golang.org/x/sys v0.50.0 // indirect
)
