#!/bin/sh
# Re-runs every reference script in this folder: *.py with /usr/bin/python3, *.R with Rscript.
# Each script prints the library versions it used and writes its JSON under
# src/test/resources/reference/. A script whose interpreter or libraries are missing is skipped
# with a message; the exit status is then still 0. A script that fails otherwise makes this fail.
# The *.py scripts run before the *.R ones: paired_delong_reference.R reads the data
# paired_reference.py writes.
cd "$(dirname "$0")" || exit 1
status=0
for script in *.py *.R; do
    [ -e "$script" ] || continue            # the glob matched nothing
    case "$script" in
        *.py) interpreter=/usr/bin/python3 ;;
        *.R)  interpreter=$(command -v Rscript || echo /usr/bin/Rscript) ;;
    esac
    if [ ! -x "$interpreter" ]; then
        echo "skip $script: $interpreter not found"
        continue
    fi
    echo "== $script"
    if "$interpreter" "$script" > "/tmp/regenerate.$$.log" 2>&1; then
        cat "/tmp/regenerate.$$.log"
    elif grep -qE "ModuleNotFoundError|ImportError|there is no package called" "/tmp/regenerate.$$.log"; then
        echo "skip $script: a library it needs is missing:"
        grep -E "ModuleNotFoundError|ImportError|there is no package called" "/tmp/regenerate.$$.log" | head -1
    else
        cat "/tmp/regenerate.$$.log"
        echo "FAILED: $script"
        status=1
    fi
done
rm -f "/tmp/regenerate.$$.log"
exit $status
