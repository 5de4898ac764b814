module example.com/helpdesk

go 1.21

require github.com/overfact/overfact/fixes/lgamma v0.1.0

// The helper module that overfact's fixes import, from this repository.
replace github.com/overfact/overfact/fixes/lgamma => ../../fixes/lgamma
