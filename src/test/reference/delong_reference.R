#!/usr/bin/Rscript
# Reference values for org.assay.stats.DeLong.
#
# Run with /usr/bin/Rscript (Debian r-cran-proc, r-cran-jsonlite). Writes
# src/test/resources/reference/delong_reference.json with, for each case, the scores and labels
# (inputs) and pROC's auc(), var(method = "delong"), ci.auc(method = "delong") at 0.95 and 0.90,
# and the DeLong placement values from pROC's internal delongPlacements() (X: one per positive,
# the case placements; Y: one per negative, the control placements).
#
# pROC: Robin et al. (2011), BMC Bioinformatics 12:77. DeLong, DeLong & Clarke-Pearson (1988),
# Biometrics 44:837-845. Every roc() call sets levels = c(control, case) and direction = "<"
# (controls score lower than cases) so pROC does not guess the direction.
suppressPackageStartupMessages({
  library(pROC)
  library(jsonlite)
})
cat("R", as.character(getRversion()), "pROC", as.character(packageVersion("pROC")),
    "jsonlite", as.character(packageVersion("jsonlite")), "\n")

one_case <- function(name, scores, positive) {
  r <- roc(response = as.integer(positive), predictor = scores, levels = c(0L, 1L),
           direction = "<", quiet = TRUE)
  placements <- pROC:::delongPlacements(r)
  ci95 <- ci.auc(r, conf.level = 0.95, method = "delong")
  ci90 <- ci.auc(r, conf.level = 0.90, method = "delong")
  list(name = name, scores = scores, positive = as.logical(positive),
       auc = as.numeric(auc(r)), variance = var(r, method = "delong"),
       ci95 = c(ci95[1], ci95[3]), ci90 = c(ci90[1], ci90[3]),
       case_placements = placements$X, control_placements = placements$Y)
}

set.seed(19880901)
cases <- list()
# Generated data with many ties: scores rounded to one decimal.
n1 <- 60; n0 <- 90
labels <- c(rep(1L, n1), rep(0L, n0))
scores <- round(c(rnorm(n1, 0.8, 1), rnorm(n0, 0, 1)), 1)
perm <- sample.int(n1 + n0)
cases[[length(cases) + 1]] <- one_case("generated, rounded to 0.1 (ties)", scores[perm], labels[perm])
# Generated, continuous (no ties), unbalanced.
labels <- c(rep(1L, 17), rep(0L, 143))
scores <- c(rnorm(17, 1.2, 1), rnorm(143, 0, 1.5))
cases[[length(cases) + 1]] <- one_case("generated, continuous, 17 vs 143", scores, labels)
# Generated, coarse integer scores 1..5 (heavy ties), AUC below 0.5 on purpose.
labels <- rbinom(200, 1, 0.3)
scores <- sample(1:5, 200, replace = TRUE, prob = c(.1, .2, .4, .2, .1)) - labels
scores <- pmax(1, scores)
cases[[length(cases) + 1]] <- one_case("generated, integers 1..5, AUC < 0.5", as.numeric(scores), labels)
# Perfect separation: variance 0.
cases[[length(cases) + 1]] <- one_case("perfect separation", c(0.1, 0.2, 0.3, 0.7, 0.8, 0.9, 0.95),
                                       c(0L, 0L, 0L, 1L, 1L, 1L, 1L))

# pROC's bundled aSAH data (Robin et al. 2011): outcome Poor = case, Good = control.
data(aSAH)
poor <- as.integer(aSAH$outcome == "Poor")
cases[[length(cases) + 1]] <- one_case("aSAH s100b vs outcome", aSAH$s100b, poor)
cases[[length(cases) + 1]] <- one_case("aSAH wfns vs outcome", as.numeric(aSAH$wfns), poor)

out <- list(
  generated_by = sprintf("src/test/reference/delong_reference.R with R %s, pROC %s, jsonlite %s",
                         as.character(getRversion()), as.character(packageVersion("pROC")),
                         as.character(packageVersion("jsonlite"))),
  cases = cases)
args <- commandArgs(trailingOnly = FALSE)
script <- sub("^--file=", "", args[grep("^--file=", args)])
path <- file.path(dirname(normalizePath(script)), "..", "resources", "reference", "delong_reference.json")
writeLines(toJSON(out, auto_unbox = TRUE, digits = NA, pretty = TRUE), path)
cat("wrote", normalizePath(path), "\n")
