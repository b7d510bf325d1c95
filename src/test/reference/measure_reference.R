#!/usr/bin/Rscript
# Reference values for `assay measure --metric roc_auc --interval delong`: pROC's AUC and
# DeLong interval on src/test/resources/reference/measure_binary.csv (written by
# measure_reference.py). Run with Debian's Rscript (r-cran-proc).
suppressMessages(library(pROC))
args <- commandArgs(trailingOnly = FALSE)
here <- dirname(normalizePath(sub("^--file=", "", args[grep("^--file=", args)])))
res <- file.path(here, "..", "resources", "reference")
d <- read.csv(file.path(res, "measure_binary.csv"))
r <- roc(d$label, d$score, levels = c(0, 1), direction = "<", quiet = TRUE)
ci <- ci.auc(r, method = "delong", conf.level = 0.95)
v <- var(r, method = "delong")
json <- sprintf(paste0('{\n "generated_by": "pROC %s, %s",\n "auc": %.17g,\n "variance": %.17g,\n',
                       ' "ci95": [%.17g, %.17g]\n}\n'),
                as.character(packageVersion("pROC")), R.version.string, as.numeric(r$auc), v, ci[1], ci[3])
writeLines(json, file.path(res, "measure_proc.json"), sep = "")
cat("wrote measure_proc.json\n")
