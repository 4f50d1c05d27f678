# Reference analyses for src/r-model-reference.test.ts, called by generate-r-model-fixtures.mjs:
#   Rscript generate-r-model-fixtures.R cases.json results.json
# Each case names its family; each family's function below is the R a statistician would write for it.
suppressPackageStartupMessages({ library(jsonlite); library(survival); library(multcomp); library(MASS); library(emmeans) })
emm_options(msg.nesting = FALSE, msg.interaction = FALSE)
args <- commandArgs(trailingOnly = TRUE)
cases <- fromJSON(args[1], simplifyVector = FALSE)

column <- function(obs, name) vapply(obs, function(o) if (is.null(o[[name]])) NA_character_ else as.character(o[[name]]), "")
first_appearance <- function(x) factor(x, levels = unique(x))
with_control_first <- function(x, control) factor(x, levels = c(control, setdiff(unique(x), control)))

# Data frame of a case: treatment (control first), block nested in site (blk), site.
case_frame <- function(case) {
  obs <- case$observations
  d <- data.frame(treatment = with_control_first(column(obs, "treatment"), case$control))
  if (case$design != "crd") d$block <- first_appearance(column(obs, "block"))
  if (case$design == "multisite-rcbd") {
    d$site <- first_appearance(column(obs, "site"))
    d$blk <- first_appearance(paste(d$site, "/", d$block))
  } else if (case$design == "rcbd") {
    d$blk <- first_appearance(d$block)
  }
  d
}

# Models compared for each term's likelihood-ratio test (the term dropped; a site with its blocks).
# Blocks nested in sites: site + site:block codes each site's blocks by contrasts (no aliased columns, and the
# nesting emmeans needs); with whole blocks left out (censored times), blk (one label per site and block,
# unused levels dropped) spans the same space, as survreg counts the df of an unused site:block column.
model_formulas <- function(design, response, nested = "site + site:block") {
  full <- switch(design, crd = "~ treatment", rcbd = "~ blk + treatment", "multisite-rcbd" = paste("~", nested, "+ treatment"))
  drops <- switch(design,
    crd = list(treatment = "~ 1"),
    rcbd = list(block = "~ treatment", treatment = "~ blk"),
    "multisite-rcbd" = list(site = "~ treatment", "block:site" = "~ site + treatment", treatment = paste("~", nested)))
  list(full = as.formula(paste(response, full)), drops = lapply(drops, function(f) as.formula(paste(response, f))))
}

# Single-step many-to-one comparisons on the treatment coefficients (multcomp), normal or t.
dunnett_rows <- function(cf, V, df) {
  keep <- !is.na(cf)  # aliased columns (an empty cell) have no estimate
  cf <- cf[keep]; V <- V[names(cf), names(cf), drop = FALSE]
  tr <- grep("^treatment", names(cf))
  K <- diag(length(cf))[tr, , drop = FALSE]
  rownames(K) <- sub("^treatment", "", names(cf)[tr])
  g <- glht(parm(cf, V, df = df), linfct = K)
  set.seed(1)
  s <- summary(g)
  set.seed(1)
  sim <- confint(g)
  lapply(seq_along(tr), function(i) list(treatment = rownames(K)[i], estimate = unname(cf[tr[i]]), se = sqrt(V[tr[i], tr[i]]),
    lower = sim$confint[i, "lwr"], upper = sim$confint[i, "upr"], p = unname(s$test$pvalues[i]), critical = attr(sim$confint, "calpha")))
}

analyse_censored <- function(case) {
  obs <- case$observations
  d <- case_frame(case)
  d$time <- as.numeric(column(obs, "value"))
  d$status <- ifelse(vapply(obs, function(o) isTRUE(o$censored), TRUE), 0, 1)
  ctl <- survreg.control(rel.tolerance = 1e-13, iter.max = 200)
  f <- model_formulas(case$design, "Surv(time, status)", nested = "blk")
  # As Friable: a block where no plot drained is left out of the time-ratio model (its effect would run to infinity).
  all_d <- d
  if (!is.null(d$blk)) d <- droplevels(d[ave(d$status, d$blk, FUN = sum) > 0, ])
  m <- survreg(f$full, data = d, dist = case$distribution, control = ctl)
  tests <- lapply(names(f$drops), function(term) {
    r <- survreg(f$drops[[term]], data = d, dist = case$distribution, control = ctl)
    a <- anova(r, m)
    list(term = term, df = a$Df[2], chiSquare = a$Deviance[2], p = a[["Pr(>Chi)"]][2])
  })
  drop1_rows <- if (case$design == "rcbd") {
    # drop1 re-evaluates the call, so the data and settings must be visible globally.
    assign("drop1_data", d, envir = globalenv()); assign("drop1_control", ctl, envir = globalenv())
    m1 <- eval(bquote(survreg(Surv(time, status) ~ blk + treatment, data = drop1_data, dist = .(case$distribution), control = drop1_control)), globalenv())
    d1 <- drop1(m1, test = "Chisq")
    lapply(rownames(d1)[-1], function(term) list(term = term, df = d1$Df[term == rownames(d1)], chiSquare = d1$LRT[term == rownames(d1)]))
  } else NULL
  cf <- coef(m)
  V <- vcov(m)[names(cf), names(cf)]
  treatment_coefficients <- lapply(grep("^treatment", names(cf)), function(j) list(treatment = sub("^treatment", "", names(cf)[j]), estimate = unname(cf[j]), se = sqrt(V[j, j])))
  strata_formula <- switch(case$design, crd = Surv(time, status) ~ treatment, Surv(time, status) ~ treatment + strata(blk))
  lr <- survdiff(strata_formula, data = all_d)
  km <- survfit(Surv(time, status) ~ treatment, data = all_d, conf.type = "log")
  q <- quantile(km, 0.5)
  curves <- lapply(seq_along(km$strata), function(k) {
    z <- km[k]
    list(treatment = sub("^treatment=", "", names(km$strata)[k]), time = z$time, surv = z$surv, lower = z$lower, upper = z$upper,
      atRisk = z$n.risk, events = z$n.event)
  })
  medians <- lapply(seq_along(km$strata), function(k) list(treatment = sub("^treatment=", "", names(km$strata)[k]),
    median = unname(q$quantile[k]), lower = unname(q$lower[k]), upper = unname(q$upper[k])))
  list(logLik = m$loglik[2], scale = m$scale, treatmentCoefficients = treatment_coefficients, tests = tests, drop1 = drop1_rows,
    logRank = list(chiSquare = lr$chisq, df = length(lr$n) - 1, p = pchisq(lr$chisq, length(lr$n) - 1, lower.tail = FALSE)),
    timeRatios = dunnett_rows(cf, V, 0), curves = curves, medians = medians)
}

analyse_ordinal <- function(case) {
  d <- case_frame(case)
  d$score <- factor(as.numeric(column(case$observations, "value")), ordered = TRUE)
  ctl <- list(reltol = 1e-15, maxit = 5000)
  f <- model_formulas(case$design, "score")
  # Started from no effects and the observed cumulative shares (polr's own glm start fails on sparse tables).
  fit_with <- function(formula) {
    k <- ncol(model.matrix(formula, d)) - 1
    polr(formula, data = d, Hess = TRUE, control = ctl, start = c(rep(0, k), qlogis(cumsum(table(d$score))[-nlevels(d$score)] / nrow(d))))
  }
  m <- fit_with(f$full)
  tests <- lapply(names(f$drops), function(term) {
    a <- anova(fit_with(f$drops[[term]]), m)
    list(term = term, df = a[["   Df"]][2], chiSquare = a[["LR stat."]][2], p = a[["Pr(Chi)"]][2])
  })
  cf <- coef(m)
  V <- vcov(m)
  treatment_coefficients <- lapply(grep("^treatment", names(cf)), function(j) list(treatment = sub("^treatment", "", names(cf)[j]), estimate = unname(cf[j]), se = sqrt(V[names(cf)[j], names(cf)[j]])))
  e <- if (case$design == "multisite-rcbd") emmeans(m, ~ treatment | score, mode = "prob", nesting = "block %in% site") else emmeans(m, ~ treatment | score, mode = "prob")
  es <- as.data.frame(summary(e))
  probabilities <- lapply(seq_len(nrow(es)), function(i) list(treatment = as.character(es$treatment[i]), category = as.character(es$score[i]), probability = es$prob[i], se = es$SE[i]))
  list(logLik = as.numeric(logLik(m)), thresholds = unname(m$zeta), treatmentCoefficients = treatment_coefficients, tests = tests,
    oddsRatios = dunnett_rows(cf, V[names(cf), names(cf)], 0), probabilities = probabilities)
}

analyse_counts <- function(case) {
  d <- case_frame(case)
  d$count <- as.numeric(column(case$observations, "value"))
  f <- model_formulas(case$design, "count")
  m <- glm(f$full, data = d, family = poisson, control = glm.control(epsilon = 1e-14, maxit = 100))
  pearson <- sum(residuals(m, type = "pearson")^2)
  rdf <- df.residual(m)
  over <- pchisq(pearson, rdf, lower.tail = FALSE) < 0.05 && pearson / rdf > 1
  family <- if (over) quasipoisson else poisson
  m <- glm(f$full, data = d, family = family, control = glm.control(epsilon = 1e-14, maxit = 100))
  test <- if (over) "F" else "Chisq"
  tests <- lapply(names(f$drops), function(term) {
    r <- glm(f$drops[[term]], data = d, family = family, control = glm.control(epsilon = 1e-14, maxit = 100))
    a <- anova(r, m, test = test)
    list(term = term, df = a$Df[2], deviance = a$Deviance[2], f = if (over) a$F[2] else NULL, p = a[[ncol(a)]][2])
  })
  cf <- coef(m)
  V <- vcov(m)
  treatment_coefficients <- lapply(grep("^treatment", names(cf)), function(j) list(treatment = sub("^treatment", "", names(cf)[j]), estimate = unname(cf[j]), se = sqrt(V[j, j])))
  # Quasi-Poisson limits on t with the residual df, as summary.glm tests (emmeans would use z).
  edf <- if (over) rdf else Inf
  e <- if (case$design == "multisite-rcbd") emmeans(m, ~ treatment, type = "response", nesting = "block %in% site", df = edf) else emmeans(m, ~ treatment, type = "response", df = edf)
  es <- as.data.frame(summary(e))
  lower_name <- grep("LCL$|lower.CL", names(es), value = TRUE); upper_name <- grep("UCL$|upper.CL", names(es), value = TRUE)
  rates <- lapply(seq_len(nrow(es)), function(i) list(treatment = as.character(es$treatment[i]), rate = es$rate[i], lower = es[[lower_name]][i], upper = es[[upper_name]][i]))
  list(family = if (over) "quasipoisson" else "poisson", dispersion = pearson / rdf, pearson = pearson, residualDf = rdf, deviance = deviance(m),
    treatmentCoefficients = treatment_coefficients, tests = tests, rateRatios = dunnett_rows(cf, V, if (over) rdf else 0), rates = rates)
}

analyse <- function(case) switch(case$family, censored = analyse_censored(case), ordinal = analyse_ordinal(case), counts = analyse_counts(case))

results <- lapply(cases, analyse)
versions <- sapply(c("survival", "nlme", "emmeans", "MASS", "car", "multcomp"), function(p) tryCatch(as.character(packageVersion(p)), error = function(e) NA))
writeLines(toJSON(list(r = list(version = R.version.string, packages = as.list(versions)), cases = results), auto_unbox = TRUE, digits = I(17), na = "null", null = "null"), args[2])
