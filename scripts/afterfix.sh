#!/usr/bin/env bash
# afterfix.sh runs the "After -fix" differential over the realistic
# scenario packages (testdata/src's scenarios and the demo module) on the
# whole input grid: every function with numbers in and one number out,
# original and `overfact -fix`ed, against the exact evaluation of the
# original's own arithmetic (internal/exacteval). It prints the table of
# docs/fixes.md ("After -fix on the scenario packages") and, per function
# that is not right both before and after, its verdict counts and one
# input that shows it.
#
# The test suite runs the same differential on a sample of at most 40
# inputs a function (TestAfterFixScenarios); this script takes up to 400
# (the whole grid of one- and two-parameter functions) and a larger step
# bound, so it may show functions the quick grid does not reach: the
# lists in fixes/afterfix_test.go are kept for the quick grid.
#
# Run from the repository root:   scripts/afterfix.sh
set -euo pipefail
cd "$(dirname "$0")/.."
OVERFACT_AFTERFIX_FULL=1 OVERFACT_AFTERFIX_DETAIL=1 \
	go test -count=1 -timeout 60m -run 'TestAfterFixScenarios$' -v ./fixes
