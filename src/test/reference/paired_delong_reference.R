#!/usr/bin/Rscript
# Reference values for org.assay.stats.PairedDeLong (two correlated ROC AUCs).
#
# Run with /usr/bin/Rscript (Debian r-cran-proc, r-cran-jsonlite), after paired_reference.py,
# which writes the invented end-to-end data this script also reads. Writes
# src/test/resources/reference/paired_delong_reference.json with, per case, the inputs (labels and
# both systems' scores, or the file names) and pROC's
# roc.test(roc1, roc2, method = "delong", paired = TRUE): statistic (z), p.value, conf.int at
# 0.95; var(roc, method = "delong") of each and cov(roc1, roc2, method = "delong").
#
# pROC: Robin et al. (2011), BMC Bioinformatics 12:77. DeLong, DeLong & Clarke-Pearson (1988),
# Biometrics 44:837-845. Every roc() call sets levels = c(control, case) and direction = "<".
suppressPackageStartupMessages({
  library(pROC)
  library(jsonlite)
})
cat("R", as.character(getRversion()), "pROC", as.character(packageVersion("pROC")),
    "jsonlite", as.character(packageVersion("jsonlite")), "\n")

paired <- function(positive, a, b) {
  ra <- roc(response = as.integer(positive), predictor = a, levels = c(0L, 1L), direction = "<", quiet = TRUE)
  rb <- roc(response = as.integer(positive), predictor = b, levels = c(0L, 1L), direction = "<", quiet = TRUE)
  t <- roc.test(ra, rb, method = "delong", paired = TRUE)
  list(auc_a = as.numeric(auc(ra)), auc_b = as.numeric(auc(rb)),
       variance_a = var(ra, method = "delong"), variance_b = var(rb, method = "delong"),
       covariance = cov(ra, rb, method = "delong"),
       z = as.numeric(t$statistic), p_value = t$p.value, conf_int_95 = as.numeric(t$conf.int))
}

one_case <- function(name, positive, a, b) {
  c(list(name = name, positive = as.logical(positive), scores_a = a, scores_b = b), paired(positive, a, b))
}

set.seed(19880902)
cases <- list()
# Correlated continuous scores: the second system is the first plus noise.
lab <- c(rep(1L, 45), rep(0L, 75))
s1 <- c(rnorm(45, 1, 1), rnorm(75, 0, 1))
s2 <- s1 + rnorm(120, 0, 0.7)
cases[[length(cases) + 1]] <- one_case("correlated, continuous", lab, s1, s2)
# Heavy ties: scores rounded to one decimal and integers 1..5.
lab <- rbinom(150, 1, 0.35)
s1 <- round(rnorm(150, 0.9 * lab, 1), 1)
s2 <- as.numeric(pmin(5, pmax(1, round(3 + 1.2 * lab + rnorm(150, 0, 1)))))
cases[[length(cases) + 1]] <- one_case("ties: rounded against integers 1..5", lab, s1, s2)
# Small and unbalanced.
lab <- c(1L, 1L, 1L, 0L, 0L, 0L, 0L, 0L, 0L, 0L, 0L, 0L)
s1 <- c(0.9, 0.4, 0.75, 0.3, 0.5, 0.2, 0.1, 0.6, 0.35, 0.05, 0.4, 0.8)
s2 <- c(0.6, 0.7, 0.65, 0.3, 0.6, 0.1, 0.2, 0.2, 0.7, 0.1, 0.3, 0.5)
cases[[length(cases) + 1]] <- one_case("small, 3 vs 9, with ties", lab, s1, s2)
# pROC's bundled aSAH data (Robin et al. 2011): outcome Poor = case; s100b against wfns.
data(aSAH)
poor <- as.integer(aSAH$outcome == "Poor")
cases[[length(cases) + 1]] <- one_case("aSAH s100b vs wfns", poor, aSAH$s100b, as.numeric(aSAH$wfns))

args <- commandArgs(trailingOnly = FALSE)
script <- sub("^--file=", "", args[grep("^--file=", args)])
here <- dirname(normalizePath(script))
# The end-to-end data of paired_reference.py, matched by id as the audit does.
ours <- read.csv(file.path(here, "..", "resources", "paired", "ours.csv"), colClasses = c(id = "character"))
base <- read.csv(file.path(here, "..", "resources", "paired", "baseline.csv"), colClasses = c(id = "character"))
base <- base[match(ours$id, base$id), ]
stopifnot(identical(ours$label, base$label))
end_to_end <- c(list(files = c("paired/ours.csv", "paired/baseline.csv")), paired(ours$label == 1, ours$score, base$score))

out <- list(
  generated_by = sprintf("src/test/reference/paired_delong_reference.R with R %s, pROC %s, jsonlite %s",
                         as.character(getRversion()), as.character(packageVersion("pROC")),
                         as.character(packageVersion("jsonlite"))),
  cases = cases,
  end_to_end = end_to_end)
path <- file.path(here, "..", "resources", "reference", "paired_delong_reference.json")
writeLines(toJSON(out, auto_unbox = TRUE, digits = NA, pretty = TRUE), path)
cat("wrote", normalizePath(path), "\n")
