#!/usr/bin/env bash
# Rebuilds the PDF test corpus in this folder from src/*.tex and Debian tools.
#
# Builds everything twice in a scratch folder, checks that both builds are
# byte-identical (the encrypted files are compared after decryption, see
# below), and only then copies the result over the committed files.
# Without pdflatex (e.g. on CI) it says so and exits 0 without touching anything.
set -euo pipefail

here=$(cd "$(dirname "$0")" && pwd)
cd "$here"

if ! command -v pdflatex >/dev/null 2>&1; then
    echo "build.sh: pdflatex not found; PDF corpus left as committed"
    exit 0
fi
for tool in pdftoppm img2pdf qpdf pdfinfo cmp; do
    if ! command -v "$tool" >/dev/null 2>&1; then
        echo "build.sh: $tool not found (apt-get install poppler-utils img2pdf qpdf)" >&2
        exit 1
    fi
done

# Fixed dates and no trailer /ID (each source has \pdftrailerid{}) make pdfTeX reproducible.
export SOURCE_DATE_EPOCH=1767225600 FORCE_SOURCE_DATE=1 TZ=UTC LC_ALL=C

scratch=$(mktemp -d)
trap 'rm -rf "$scratch"' EXIT

# The page that is rendered to an image for bad/scanned.pdf, and the good PDF
# that is encrypted and truncated.
good=booktabs-bold

compile() { # compile NAME OUTDIR: pdflatex twice (for references), aux files stay in scratch
    local name=$1 outdir=$2 tmp="$scratch/tex-$1-$RANDOM"
    mkdir -p "$tmp"
    for pass in 1 2; do
        if ! pdflatex -interaction=nonstopmode -halt-on-error -output-directory "$tmp" \
                "src/$name.tex" >"$tmp/stdout.txt" 2>&1; then
            echo "build.sh: pdflatex failed on src/$name.tex (pass $pass); last lines:" >&2
            tail -20 "$tmp/stdout.txt" >&2
            exit 1
        fi
    done
    cp "$tmp/$name.pdf" "$outdir/$name.pdf"
    rm -rf "$tmp"
}

build_into() { # build_into OUTDIR
    local out=$1
    mkdir -p "$out/bad"
    local tex name
    for tex in src/*.tex; do
        name=$(basename "$tex" .tex)
        if [ "$name" = no-tables ]; then
            compile "$name" "$out/bad"
        else
            compile "$name" "$out"
        fi
    done

    # Image-only PDF: no text layer at all.
    pdftoppm -r 100 -png -f 1 -l 1 "$out/$good.pdf" "$scratch/scan"
    img2pdf --engine internal --nodate "$scratch/scan-1.png" -o "$out/bad/scanned.pdf"
    rm -f "$scratch"/scan-*.png

    # AES-256 (R6) with a user password, and with an empty user password.
    # --static-id only fixes the trailer /ID (R6 keys do not depend on it).
    qpdf --static-id --encrypt reader-pass owner-pass 256 -- "$out/$good.pdf" "$out/bad/encrypted.pdf"
    qpdf --static-id --encrypt "" owner-pass 256 --modify=none -- "$out/$good.pdf" "$out/bad/owner-only.pdf"

    # Cut off at 60 percent: no xref table, no trailer, unfinished streams.
    local size
    size=$(stat -c %s "$out/$good.pdf")
    head -c $((size * 6 / 10)) "$out/$good.pdf" >"$out/bad/truncated.pdf"

    printf 'This is a plain text file named like a PDF.\nIt has no %%PDF header and no objects.\n' \
        >"$out/bad/not-a-pdf.pdf"
    : >"$out/bad/empty.pdf"
}

# Encryption with AES-256 draws a random file key and salts on every run, so
# encrypted files are compared by their decrypted content.
decrypted() { # decrypted FILE PASSWORD OUT
    qpdf --password="$2" --decrypt --deterministic-id "$1" "$3"
}
password_of() {
    case "$1" in
        bad/encrypted.pdf) echo reader-pass ;;
        *) echo "" ;;
    esac
}
is_encrypted() { [ "$1" = bad/encrypted.pdf ] || [ "$1" = bad/owner-only.pdf ]; }

build_into "$scratch/a"
build_into "$scratch/b"

status=0
identical=0
for path in $(cd "$scratch/a" && find . -name '*.pdf' | sed 's|^\./||' | sort); do
    if is_encrypted "$path"; then
        pw=$(password_of "$path")
        decrypted "$scratch/a/$path" "$pw" "$scratch/da.pdf"
        decrypted "$scratch/b/$path" "$pw" "$scratch/db.pdf"
        if ! cmp -s "$scratch/da.pdf" "$scratch/db.pdf"; then
            echo "build.sh: $path decrypts differently in two builds" >&2
            status=1
        fi
    elif cmp -s "$scratch/a/$path" "$scratch/b/$path"; then
        identical=$((identical + 1))
    else
        echo "build.sh: $path is not byte-identical in two builds" >&2
        status=1
    fi
done
if [ "$status" -ne 0 ]; then
    echo "build.sh: rebuild is not reproducible; committed files left alone" >&2
    exit 1
fi
echo "build.sh: $identical PDFs byte-identical over two builds; encrypted ones identical after decryption"

# Install. An encrypted file is only replaced when its decrypted content
# changed, so that a rebuild does not churn the committed bytes.
mkdir -p bad
for path in $(cd "$scratch/a" && find . -name '*.pdf' | sed 's|^\./||' | sort); do
    if is_encrypted "$path" && [ -f "$path" ]; then
        pw=$(password_of "$path")
        decrypted "$scratch/a/$path" "$pw" "$scratch/new.pdf"
        if decrypted "$path" "$pw" "$scratch/old.pdf" 2>/dev/null \
                && cmp -s "$scratch/new.pdf" "$scratch/old.pdf"; then
            continue
        fi
    fi
    cp "$scratch/a/$path" "$path"
done
echo "build.sh: corpus written to $here"
