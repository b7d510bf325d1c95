#!/usr/bin/env bash
# Regenerates the committed hostile PDFs of this folder with PDFBox, from the test utility
# org.assay.cli.BadPdfs (src/test/java/org/assay/cli/BadPdfs.java). The output is byte-identical
# for the same PDFBox version; BadDocumentFilesTest checks the committed files against it.
# Usage: bash src/test/resources/bad/pdf/make.sh
set -euo pipefail
root="$(cd "$(dirname "$0")/../../../../.." && pwd)"
cd "$root"
mvn -q -B test-compile
mvn -q -B dependency:build-classpath -Dmdep.outputFile=target/bad-pdfs.classpath
java -cp "target/test-classes:target/classes:$(cat target/bad-pdfs.classpath)" org.assay.cli.BadPdfs src/test/resources/bad/pdf
