module github.com/overfact/overfact

go 1.26.0

require (
	github.com/overfact/overfact/fixes/lgamma v0.1.0
	golang.org/x/mod v0.42.0
	golang.org/x/tools v0.52.0
	gonum.org/v1/gonum v0.17.0
)

require (
	golang.org/x/sync v0.24.0 // indirect
)

