# heldout-score.py LABELS DIR OUTPUT scores overfact's plain output
# (file:line:col: message lines, as `overfact ./... > OUTPUT 2>&1` prints
# them in DIR) against the hand labels of a held-out scenario set
# (docs/blind2-labels.tsv, blind3, blind4): a labelled function is found
# when a finding lies in it. Function spans come from a scan of the
# top-level `func` lines of each file: a function runs to the line before
# the next one. Run by scripts/heldout.sh.
import sys, re, subprocess, os, glob
labels = {}
for line in open(sys.argv[1]):
    if line.startswith('#') or line.startswith('package\t') or not line.strip():
        continue
    f = line.rstrip('\n').split('\t')
    labels[(f[0], f[1])] = f[2]
root = sys.argv[2]   # dir holding the package copies
out = open(sys.argv[3]).read().splitlines()
# function spans via go/ast would be best; use a crude scan of 'func' lines
spans = {}
for pkg in set(p for p, _ in labels):
    for fn in glob.glob(os.path.join(root, pkg, '*.go')):
        src = open(fn).read().split('\n')
        starts = []
        for i, l in enumerate(src):
            m = re.match(r'^func (\(([a-z]\w* )?(\*?\w+)\) )?(\w+)', l)
            if m:
                recv = m.group(3)
                name = m.group(4)
                key = (('(%s).%s' % (recv, name)) if recv and recv.startswith('*') else ('%s.%s' % (recv, name) if recv else name))
                starts.append((i + 1, key))
        for j, (ln, key) in enumerate(starts):
            end = starts[j + 1][0] - 1 if j + 1 < len(starts) else len(src)
            spans.setdefault((pkg, os.path.basename(fn)), []).append((ln, end, key))
found = set()
for l in out:
    m = re.match(r'^(?:\./)?([^/:]+)/([^/:]+\.go):(\d+):\d+: ', l)
    if not m or l.split(': ', 1)[1].startswith('\t'):
        continue
    pkg, fn, ln = m.group(1), m.group(2), int(m.group(3))
    for a, b, key in spans.get((pkg, fn), []):
        if a <= ln <= b:
            found.add((pkg, key))
bad = [k for k, v in labels.items() if v == 'BAD']
tp = [k for k in bad if k in found]
fp = [k for k in found if labels.get(k) == 'SAFE']
neutral = [k for k in found if labels.get(k) == 'NEUTRAL']
unl = [k for k in found if k not in labels]
print('BAD %d found %d recall %.3f; SAFE with finding %d; NEUTRAL with finding %d; unlabelled with finding %d' % (len(bad), len(tp), len(tp)/len(bad), len(fp), len(neutral), len(unl)))
print('precision (NEUTRAL left out) %d/%d' % (len(tp), len(tp)+len(fp)))
for k in sorted(set(bad) - set(tp)):
    print('missed', k)
for k in sorted(fp): print('FP', k)
for k in sorted(unl): print('unlabelled', k)
