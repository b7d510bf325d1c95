#!/usr/bin/Rscript
# Reference bootstrap intervals from R boot (Debian r-cran-boot) for assay's BootstrapEngine tests.
#
# Run after bootstrap_reference.py (which writes the inputs), with Debian's R:
#     /usr/bin/Rscript src/test/reference/bootstrap_reference.R
# Reads src/test/resources/reference/bootstrap_data.json, writes bootstrap_r.json.
#
# boot() + boot.ci(type = c("perc", "basic", "bca")), 30 seeds at R = 10,000 resamples; the mean
# endpoint and its standard deviation across seeds are recorded (Monte Carlo estimates).
# For "bca" the influence values are passed as jackknife values, L = empinf(type = "jack"), so
# the acceleration is the jackknife one (Efron & Tibshirani 1993 eq. 14.15), as in assay and
# scipy; boot.ci's default would estimate L by regression on the replicates.
# bca is not run for the 0/1 data: boot.ci's bca.ci computes z0 from sum(t < t0) (ties at the
# estimate counted as above it), while assay and scipy count ties one half; on a proportion many
# replicates tie, so the two rules give different intervals by design.
suppressPackageStartupMessages({ library(boot); library(jsonlite) })

args <- commandArgs(trailingOnly = FALSE)
script <- sub("^--file=", "", args[grep("^--file=", args)])
out_dir <- normalizePath(file.path(dirname(script), "..", "resources", "reference"))
input <- fromJSON(file.path(out_dir, "bootstrap_data.json"))

versions <- list(R = paste(R.version$major, R.version$minor, sep = "."),
                 boot = as.character(packageVersion("boot")),
                 jsonlite = as.character(packageVersion("jsonlite")))
cat("versions:", paste(names(versions), unlist(versions), sep = " ", collapse = ", "), "\n")

resamples <- 10000
confidence <- 0.95
seeds <- 1:30

mean_stat <- function(d, i) mean(d$x[i])
ratio_stat <- function(d, i) sum(d$x[i]) / sum(d$y[i])

results <- list()
for (name in names(input$datasets)) {
  ds <- input$datasets[[name]]
  if (ds$statistic == "mean") {
    d <- data.frame(x = ds$x); stat <- mean_stat
  } else {
    d <- data.frame(x = ds$x, y = ds$y); stat <- ratio_stat
  }
  types <- if (name == "binary_mean") c("perc", "basic") else c("perc", "basic", "bca")
  ends <- list()
  ses <- c()
  for (s in seeds) {
    set.seed(s)
    b <- boot(d, stat, R = resamples)
    ses <- c(ses, sd(b$t[, 1]))
    ci <- if ("bca" %in% types) {
      boot.ci(b, conf = confidence, type = types, L = empinf(b, type = "jack"))
    } else {
      boot.ci(b, conf = confidence, type = types)
    }
    for (ty in types) {
      field <- switch(ty, perc = "percent", basic = "basic", bca = "bca")
      row <- ci[[field]]
      ends[[ty]] <- rbind(ends[[ty]], c(row[4], row[5]))
    }
  }
  for (ty in types) {
    e <- ends[[ty]]
    results[[length(results) + 1]] <- list(
      dataset = name, method = ty,
      lower_mean = mean(e[, 1]), lower_sd = sd(e[, 1]),
      upper_mean = mean(e[, 2]), upper_sd = sd(e[, 2]),
      standard_error_mean = mean(ses), standard_error_sd = sd(ses),
      lower = e[, 1], upper = e[, 2])
    cat(sprintf("%-13s %-6s [%.6f +- %.6f, %.6f +- %.6f]\n", name, ty,
                mean(e[, 1]), sd(e[, 1]), mean(e[, 2]), sd(e[, 2])))
  }
}

out <- list(generated_by = "src/test/reference/bootstrap_reference.R",
            functions = "boot::boot(stype = 'i'), boot::boot.ci(type = perc/basic/bca, L = empinf(type = 'jack'))",
            versions = versions, resamples = resamples, confidence = confidence, seeds = seeds,
            datasets = input$datasets, results = results)
writeLines(toJSON(out, auto_unbox = TRUE, digits = NA, pretty = TRUE), file.path(out_dir, "bootstrap_r.json"))
