#!/usr/bin/Rscript
# Reference values for org.assay.stats.HanleyMcNeil: pROC's DeLong variance of the AUC on
# simulated binormal data (scores N(shift, 1) for positives, N(0, 1) for negatives).
#
# Run with /usr/bin/Rscript (Debian r-cran-proc, r-cran-jsonlite). Writes
# src/test/resources/reference/power_proc.json with, for each case, the class sizes, the shift,
# pROC's auc() and var(method = "delong"). The scores themselves are not needed by the Java test:
# Hanley & McNeil (1982) use only the AUC and the class sizes.
#
# pROC: Robin et al. (2011), BMC Bioinformatics 12:77. DeLong, DeLong & Clarke-Pearson (1988),
# Biometrics 44:837-845. roc() is called with levels = c(0, 1) and direction = "<".
suppressPackageStartupMessages({
  library(pROC)
  library(jsonlite)
})
cat("R", as.character(getRversion()), "pROC", as.character(packageVersion("pROC")),
    "jsonlite", as.character(packageVersion("jsonlite")), "\n")

set.seed(19820401)
configs <- list(c(300, 300, 1.0), c(1000, 1000, 0.5), c(150, 150, 2.0), c(500, 500, 1.5),
                c(200, 800, 1.5), c(500, 100, 1.2), c(2000, 400, 0.8))
cases <- list()
for (cfg in configs) {
  m <- cfg[1]; n <- cfg[2]; shift <- cfg[3]
  scores <- c(rnorm(m, shift, 1), rnorm(n, 0, 1))
  labels <- c(rep(1L, m), rep(0L, n))
  r <- roc(response = labels, predictor = scores, levels = c(0L, 1L), direction = "<", quiet = TRUE)
  cases[[length(cases) + 1]] <- list(positives = m, negatives = n, shift = shift,
                                     auc = as.numeric(auc(r)), delong_variance = var(r, method = "delong"))
}

out <- list(
  generated_by = sprintf("src/test/reference/power_reference.R with R %s, pROC %s, jsonlite %s",
                         as.character(getRversion()), as.character(packageVersion("pROC")),
                         as.character(packageVersion("jsonlite"))),
  binormal = cases)
args <- commandArgs(trailingOnly = FALSE)
script <- normalizePath(sub("^--file=", "", args[grep("^--file=", args)]))
target <- file.path(dirname(script), "..", "resources", "reference", "power_proc.json")
writeLines(toJSON(out, auto_unbox = TRUE, digits = NA, pretty = TRUE), target)
cat("wrote", normalizePath(target), "\n")
