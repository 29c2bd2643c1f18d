#!/usr/bin/env bash
# Runs real bibtex and pdflatex on what hesper writes (not part of npm test: it needs a
# TeX installation; on Debian `apt-get install texlive-latex-recommended` gives bibtex,
# pdflatex, natbib with plainnat.bst, url, amsmath and amssymb).
#
# 1. hostile.bib (source records with text built to forge entries) and catalog.bib (the
#    whole curated catalog): bibtex must read exactly the keys written, with no error,
#    and no forged key (Schmid2006, Forged, X) may appear in hostile.bbl.
# 2. A document citing every entry of each .bib, with the preamble the LaTeX report's
#    header lists, compiled by pdflatex (no shell escape, -recorder): no error, and
#    /etc/hostname (named by the hostile text) is never opened.
# 3. The same hostile bibliography without the url package (the case where a DOI or URL
#    printed raw could run commands): /etc/hostname must still never be opened.
# 4. The LaTeX paragraphs of the invented demo planet with hostile names, and their
#    BibTeX: compiled through bibtex and pdflatex, no error, no undefined citation, no
#    file named by the text opened.
# Usage: bash scripts/check-bibtex.sh [WORKDIR]   (default: a new temporary folder)
set -euo pipefail
here="$(cd "$(dirname "$0")/.." && pwd)"
for tool in bibtex pdflatex kpsewhich; do
  command -v "$tool" >/dev/null || { echo "check-bibtex: $tool is not installed (Debian: apt-get install texlive-latex-recommended)" >&2; exit 2; }
done
kpsewhich plainnat.bst >/dev/null || { echo "check-bibtex: plainnat.bst (natbib) is not installed" >&2; exit 2; }
work="${1:-$(mktemp -d /tmp/hesper-bibtex-XXXXXX)}"
mkdir -p "$work"
cd "$here"
node --import tsx scripts/writer-fixtures.ts "$work" >/dev/null
cd "$work"
failures=0
fail() { echo "FAIL: $*"; failures=$((failures + 1)); }
pass() { echo "ok: $*"; }

keys_of() { node -e 'const e=require(process.argv[1]);console.log(e[process.argv[2]].join("\n"))' "$work/expected.json" "$1"; }
# the keys of \bibitem[label]{key} in a .bbl (a label may run over several lines)
bibitems() { node -e 'const t=require("fs").readFileSync(process.argv[1],"utf8");for(const m of t.matchAll(/\\bibitem\[[^\]]*\]\s*\{([^}]*)\}/g))console.log(m[1])' "$1"; }

run_bibtex() { # name: writes NAME.aux citing everything, runs bibtex, compares the keys
  local name="$1"
  printf '\\relax\n\\citation{*}\n\\bibstyle{plainnat}\n\\bibdata{%s}\n' "$name" > "$name-all.aux"
  local rc=0
  bibtex -terse "$name-all" > "$name-all.bibtex.out" 2>&1 || rc=$?
  if [ "$rc" -ge 2 ]; then fail "bibtex on $name.bib exited $rc"; sed -n 1,20p "$name-all.blg"; fi
  if grep -q 'error message' "$name-all.blg"; then fail "bibtex reported errors on $name.bib"; grep -B3 'error message' "$name-all.blg" | head -20; fi
  local warnings; warnings=$(grep -c '^Warning--' "$name-all.blg" || true)
  diff <(keys_of "$name" | sort) <(bibitems "$name-all.bbl" | sort) > "$name-keys.diff" \
    && pass "bibtex read exactly the $(keys_of "$name" | wc -l) entries of $name.bib (exit $rc, $warnings warnings)" \
    || { fail "the keys bibtex read from $name.bib differ from those written"; cat "$name-keys.diff"; }
}

compile() { # tex-file: pdflatex with no shell escape and a record of every file opened
  pdflatex -no-shell-escape -interaction=nonstopmode -halt-on-error -recorder "$1" > "${1%.tex}.pdflatex.out" 2>&1
}

opened_hostname() { grep -q '/etc/hostname' "$1" 2>/dev/null; }

run_bibtex hostile
run_bibtex catalog
for forged in Schmid2006 Forged X; do
  if bibitems hostile-all.bbl | grep -qx "$forged"; then fail "bibtex read a forged entry $forged from hostile.bib"; fi
done
pass "no forged key in hostile.bbl"

preamble=$(sed -n '/^\\documentclass/,/^\\begin{document}/p' report.tex | sed '1d;$d')
for name in hostile catalog; do
  printf '\\documentclass{article}\n%s\n\\begin{document}\n\\nocite{*}\n\\bibliographystyle{plainnat}\n\\bibliography{%s}\n\\end{document}\n' "$preamble" "$name" > "$name-doc.tex"
  compile "$name-doc.tex" || true
  bibtex -terse "$name-doc" > /dev/null 2>&1 || true
  if compile "$name-doc.tex"; then pass "pdflatex typeset every entry of $name.bib with the report's preamble"; else fail "pdflatex failed on $name.bib"; grep -A5 '^!' "$name-doc.log" | head -20; fi
  if opened_hostname "$name-doc.fls"; then fail "pdflatex opened /etc/hostname while typesetting $name.bib"; else pass "no file named in $name.bib was opened"; fi
done

printf '\\documentclass{article}\n\\usepackage[T1]{fontenc}\n\\usepackage{textcomp}\n\\usepackage{amsmath,amssymb}\n\\usepackage{natbib}\n\\begin{document}\n\\nocite{*}\n\\bibliographystyle{plainnat}\n\\bibliography{hostile}\n\\end{document}\n' > nourl-doc.tex
cp hostile-doc.bbl nourl-doc.bbl
rc=0; compile nourl-doc.tex || rc=$?
if opened_hostname nourl-doc.fls; then fail "without the url package pdflatex opened /etc/hostname"; else pass "without the url package no file named in hostile.bib was opened (pdflatex exit $rc)"; fi

compile report.tex || true
bibtex -terse report > /dev/null 2>&1 || true
compile report.tex || true
if compile report.tex; then pass "pdflatex typeset the LaTeX paragraphs with hostile names and their bibliography"; else fail "pdflatex failed on report.tex"; grep -A5 '^!' report.log | head -20; fi
if grep -q 'Citation .* undefined' report.log; then fail "report.tex has undefined citations"; grep 'Citation .* undefined' report.log | head; else pass "every citation of report.tex is defined"; fi
if opened_hostname report.fls; then fail "pdflatex opened /etc/hostname while typesetting report.tex"; else pass "no file named in report.tex was opened"; fi
diff <(keys_of report | sort) <(bibitems report.bbl | sort) > report-keys.diff && pass "report.bbl holds exactly the $(keys_of report | wc -l) cited keys" || { fail "report.bbl keys differ"; cat report-keys.diff; }

echo "work folder: $work"
if [ "$failures" -gt 0 ]; then echo "$failures check(s) failed"; exit 1; fi
echo "all checks passed"
