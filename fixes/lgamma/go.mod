module github.com/overfact/overfact/fixes/lgamma

go 1.21
