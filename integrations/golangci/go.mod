module github.com/overfact/overfact/integrations/golangci

go 1.26.0

require (
	github.com/golangci/plugin-module-register v0.1.2
	github.com/overfact/overfact v0.1.0
	golang.org/x/tools v0.52.0
)

// Development builds use this checkout. A module's replace directives
// apply only where it is the main module, so a custom golangci-lint that
// requires this plugin at a release ignores them.
replace (
	github.com/overfact/overfact => ../..
	github.com/overfact/overfact/fixes/lgamma => ../../fixes/lgamma
)
