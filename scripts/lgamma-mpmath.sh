#!/usr/bin/env bash
# lgamma-mpmath.sh: the accuracy sweep of the helper module fixes/lgamma
# against mpmath (Debian package python3-mpmath). It builds the driver
# fixes/lgamma/internal/sweep, feeds it random and adversarial inputs and
# prints, per function and input class, the largest error in ulps and
# relative with the worst input; see docs/numerics.md.
#
#   scripts/lgamma-mpmath.sh [N] [SEED]    # N random samples per class (400)
#
# Takes a few minutes with the default N on 2 cores; separate from the
# unit tests. Exits 1 if any special value, sign or exact result is wrong.
set -euo pipefail
cd "$(dirname "$0")/.."
python3 -c 'import mpmath' 2>/dev/null || { echo "needs python3-mpmath (apt-get install python3-mpmath)" >&2; exit 2; }
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
(cd fixes/lgamma && go build -o "$tmp/sweep" ./internal/sweep)
python3 scripts/lgamma-mpmath.py "$tmp/sweep" "${1:-400}" "${2:-1}"
