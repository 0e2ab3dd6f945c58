# Prints columns of a data set from R's `datasets` package, one per line:
#   NAME<TAB>v1<TAB>v2 …   (numbers with 17 significant digits, NA as NA, factors as labels)
#   Rscript tests/reference/r/dataset.R precip | faithful | cars | ToothGrowth | airquality
args <- commandArgs(trailingOnly = TRUE)
d <- get(args[1], envir = as.environment("package:datasets"))
if (!is.data.frame(d)) d <- data.frame(value = as.numeric(d))
for (col in names(d)) {
  v <- d[[col]]
  out <- if (is.numeric(v)) ifelse(is.na(v), "NA", formatC(v, digits = 17, format = "g")) else as.character(v)
  cat(col, out, sep = "\t")
  cat("\n")
}
