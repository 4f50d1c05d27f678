# Reference analyses for src/r-reference.test.ts, called by generate-r-fixtures.mjs:
#   Rscript generate-r-fixtures.R cases.json results.json
# For every case: anova(lm(...)) with terms in Friable's order, emmeans least-squares means (blocks nested
# in sites), emmeans pairs with Tukey and unadjusted p, and multcomp glht Dunnett (single-step, vs the
# first treatment), and rstandard() residuals. Values arrive centred (value - centre); means are shifted back by centre.
suppressPackageStartupMessages({ library(jsonlite); library(emmeans); library(multcomp) })
args <- commandArgs(trailingOnly = TRUE)
cases <- fromJSON(args[1], simplifyVector = FALSE)
emm_options(msg.nesting = FALSE, msg.interaction = FALSE)

first_appearance <- function(x) factor(x, levels = unique(x))

analyse <- function(case) {
  obs <- case$observations
  y <- as.numeric(unlist(case$centred))
  centre <- as.numeric(case$centre)
  get <- function(name) vapply(obs, function(o) as.character(o[[name]]), "")
  design <- case$design
  if (design == "factorial-rcbd") {
    fa <- vapply(obs, function(o) o$factors$fa, ""); fb <- vapply(obs, function(o) o$factors$fb, "")
    d <- data.frame(y = y, block = first_appearance(get("block")), fa = first_appearance(fa), fb = first_appearance(fb))
    m <- lm(y ~ block + fa + fb + fa:fb, data = d)
    spec <- ~ fa:fb
  } else if (design == "multisite-rcbd") {
    d <- data.frame(y = y, site = first_appearance(get("site")), block = first_appearance(get("block")),
                    treatment = first_appearance(get("treatment")))
    # keep.order: R would otherwise move site:block after treatment (main effects first).
    m <- lm(terms(y ~ site + site:block + treatment + site:treatment, keep.order = TRUE), data = d)
    spec <- ~ treatment
  } else if (design == "rcbd") {
    d <- data.frame(y = y, block = first_appearance(get("block")), treatment = first_appearance(get("treatment")))
    m <- lm(y ~ block + treatment, data = d)
    spec <- ~ treatment
  } else {
    d <- data.frame(y = y, treatment = first_appearance(get("treatment")))
    m <- lm(y ~ treatment, data = d)
    spec <- ~ treatment
  }
  a <- anova(m)
  terms <- rownames(a)
  anova_rows <- lapply(seq_along(terms), function(i) list(term = trimws(terms[i]), df = a$Df[i], ss = a[["Sum Sq"]][i],
    f = if (is.na(a[["F value"]][i])) NULL else a[["F value"]][i], p = if (is.na(a[["Pr(>F)"]][i])) NULL else a[["Pr(>F)"]][i]))
  random_tests <- NULL
  if (design == "multisite-rcbd") {
    ms <- setNames(a[["Mean Sq"]], trimws(terms)); df <- setNames(a$Df, trimws(terms))
    f_trt <- ms[["treatment"]] / ms[["site:treatment"]]
    f_site <- ms[["site"]] / ms[["site:block"]]
    random_tests <- list(
      treatment = list(f = f_trt, p = pf(f_trt, df[["treatment"]], df[["site:treatment"]], lower.tail = FALSE)),
      site = list(f = f_site, p = pf(f_site, df[["site"]], df[["site:block"]], lower.tail = FALSE)))
  }
  emm <- if (design == "multisite-rcbd") emmeans(m, spec, nesting = "block %in% site") else emmeans(m, spec)
  es <- summary(emm)
  labels <- if (design == "factorial-rcbd") paste(es$fa, "\u00d7", es$fb) else as.character(es$treatment)
  means <- lapply(seq_len(nrow(es)), function(i) list(treatment = labels[i], mean = es$emmean[i] + centre, se = es$SE[i]))
  factor_means <- NULL
  if (design == "factorial-rcbd") {
    factor_means <- lapply(c("fa", "fb"), function(f) {
      s <- summary(emmeans(m, f))
      lapply(seq_len(nrow(s)), function(i) list(level = as.character(s[[f]][i]), mean = s$emmean[i] + centre, se = s$SE[i]))
    })
    names(factor_means) <- c("fa", "fb")
  }
  pair_rows <- function(adjust) {
    p <- summary(pairs(emm, adjust = adjust))
    k <- length(labels)
    idx <- which(upper.tri(matrix(0, k, k)), arr.ind = TRUE)
    # emmeans lists contrasts level i - level j for i < j in level order (1-2, 1-3, ..., 2-3, ...).
    order_ij <- do.call(rbind, lapply(1:(k - 1), function(i) cbind(i, (i + 1):k)))
    lapply(seq_len(nrow(p)), function(r) list(a = labels[order_ij[r, 2]], b = labels[order_ij[r, 1]],
      diff = -p$estimate[r], se = p$SE[r], p = p$p.value[r]))
  }
  set.seed(1)
  dunnett <- summary(as.glht(contrast(emm, "trt.vs.ctrl", ref = 1)))
  dunnett_rows <- lapply(seq_along(dunnett$test$tstat), function(i) list(a = labels[i + 1], b = labels[1],
    t = unname(dunnett$test$tstat[i]), p = unname(dunnett$test$pvalues[i])))
  list(anova = anova_rows, randomSites = random_tests, means = means, factorMeans = factor_means,
       tukey = pair_rows("tukey"), unadjusted = pair_rows("none"), dunnett = dunnett_rows,
       standardizedResiduals = unname(rstandard(m)))
}

results <- lapply(cases, analyse)
meta <- list(version = R.version.string, emmeans = as.character(packageVersion("emmeans")),
             multcomp = as.character(packageVersion("multcomp")), mvtnorm = as.character(packageVersion("mvtnorm")))
writeLines(toJSON(list(r = meta, cases = results), auto_unbox = TRUE, digits = NA, null = "null"), args[2])
