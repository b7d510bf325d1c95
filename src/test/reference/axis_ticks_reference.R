#!/usr/bin/Rscript
# Reference values for org.assay.report.NiceAxis: the tick positions of Heckbert's loose labeling
# ("Nice numbers for graph labels", Graphics Gems, 1990) as the R package labeling computes them
# (labeling::heckbert(dmin, dmax, m): m is the wanted number of ticks).
#
# Run with /usr/bin/Rscript (Debian r-cran-labeling, r-cran-jsonlite). Writes
# src/test/resources/reference/axis_ticks_labeling.json: for each case dmin, dmax, m and the ticks.
# The cases are ranges like the report's plots meet (percent accuracies, AUCs near 1, sums of
# recalls in the hundreds, tiny and huge spans, ranges across zero) and random ones (fixed seed).
suppressPackageStartupMessages({
  library(labeling)
  library(jsonlite)
})
cat("R", as.character(getRversion()), "labeling", as.character(packageVersion("labeling")),
    "jsonlite", as.character(packageVersion("jsonlite")), "\n")

fixed <- list(c(80.88, 89.75, 6), c(70.5, 89.2, 6), c(96.875, 99.4, 6), c(0.9805, 1.0015, 6),
              c(389.66, 444.7, 6), c(0.4, 0.6, 5), c(65.3, 84.15, 5), c(-3.2, 7.9, 6),
              c(0, 12345, 6), c(0.98205, 0.98215, 6), c(-0.0042, -0.0011, 5), c(1, 2, 6),
              c(99.9, 100.1, 6), c(0.001, 0.0011, 5), c(5, 5.05, 6))
set.seed(19900101)
random <- lapply(1:40, function(i) {
  width <- 10^runif(1, -4, 4)
  lo <- rnorm(1, 0, 1) * 10^runif(1, -3, 3)
  c(lo, lo + width, sample(4:8, 1))
})
cases <- lapply(c(fixed, random), function(cfg) {
  list(dmin = cfg[1], dmax = cfg[2], m = as.integer(cfg[3]), ticks = heckbert(cfg[1], cfg[2], cfg[3]))
})

out <- list(
  generated_by = sprintf("src/test/reference/axis_ticks_reference.R with R %s, labeling %s, jsonlite %s",
                         as.character(getRversion()), as.character(packageVersion("labeling")),
                         as.character(packageVersion("jsonlite"))),
  cases = cases)
args <- commandArgs(trailingOnly = FALSE)
script <- normalizePath(sub("^--file=", "", args[grep("^--file=", args)]))
target <- file.path(dirname(script), "..", "resources", "reference", "axis_ticks_labeling.json")
writeLines(toJSON(out, auto_unbox = TRUE, digits = NA, pretty = TRUE), target)
cat("wrote", normalizePath(target), "\n")
