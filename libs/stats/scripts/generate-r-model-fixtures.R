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

analyse_repeated <- function(case) {
  suppressPackageStartupMessages({ library(nlme); library(lme4); library(pbkrtest); library(car) })
  # R's default treatment contrasts: the REML log-likelihood depends on the coding of X (log|X'V⁻¹X|), and
  # Friable codes as R does by default. Marginal F tests need sum-to-zero contrasts: a second fit below.
  old <- options(contrasts = c("contr.treatment", "contr.poly")); on.exit(options(old))
  obs <- case$observations
  d <- case_frame(case)
  d$day <- as.numeric(column(obs, "time"))
  rounds <- unique(column(obs, "round")[order(d$day)])
  d$round <- factor(column(obs, "round"), levels = rounds)
  d$k <- as.integer(d$round)
  d$value <- as.numeric(column(obs, "value"))
  d$plot <- factor(paste(column(obs, "site"), column(obs, "block"), d$treatment))
  blocking <- switch(case$design, crd = "", rcbd = "blk + ", "multisite-rcbd" = "site + site:block + ")
  fixed <- as.formula(paste("value ~", blocking, "treatment * round"))
  ctl <- glsControl(maxIter = 500, msMaxIter = 500, tolerance = 1e-10, msTol = 1e-12, returnObject = TRUE)
  g <- switch(case$covariance,
    cs = gls(fixed, data = d, correlation = corCompSymm(form = ~ 1 | plot), method = "REML", control = ctl),
    # corCAR1 starts at φ = 0.2 a day, where 14-day gaps leave the likelihood flat: start, as Friable, at a
    # correlation of one half between neighbouring rounds.
    ar1 = gls(fixed, data = d, correlation = corCAR1(value = 0.5^(1 / mean(diff(sort(unique(d$day))))), form = ~ day | plot), method = "REML", control = ctl),
    unstructured = gls(fixed, data = d, correlation = corSymm(form = ~ k | plot), weights = varIdent(form = ~ 1 | round), method = "REML", control = ctl))
  full_plot <- names(which.max(table(d$plot)))
  V <- getVarCov(g, individual = full_plot)
  emg <- as.data.frame(summary(emmeans(g, ~ treatment * round, mode = "df.error", data = d)))
  options(contrasts = c("contr.sum", "contr.poly"))
  marginal <- anova(update(g, data = d), type = "marginal")
  options(contrasts = c("contr.treatment", "contr.poly"))
  wald <- lapply(c("treatment", "round", "treatment:round"), function(term) list(term = term, numDf = marginal[term, "numDF"], f = marginal[term, "F-value"]))
  phi <- if (case$covariance == "ar1") unname(coef(g$modelStruct$corStruct, unconstrained = FALSE)) else NULL
  result <- list(logLik = as.numeric(logLik(g)), aic = AIC(g), covariance = unname(as.vector(V)), phi = phi,
    means = lapply(seq_len(nrow(emg)), function(i) list(treatment = as.character(emg$treatment[i]), round = as.character(emg$round[i]), mean = emg$emmean[i], se = emg$SE[i])),
    wald = wald)
  if (case$covariance == "cs") {
    # Compound symmetry = a random plot intercept: Kenward–Roger from pbkrtest on the lmer fit.
    lmm <- lmer(update(fixed, . ~ . + (1 | plot)), data = d, REML = TRUE)
    em <- emmeans(lmm, ~ treatment * round, lmer.df = "kenward-roger")
    es <- as.data.frame(summary(em))
    lf <- em@linfct
    nt <- nlevels(d$treatment); nr <- nlevels(d$round)
    cell <- function(t, r) lf[(r - 1) * nt + t, ]
    tmean <- function(t) Reduce(`+`, lapply(1:nr, function(r) cell(t, r))) / nr
    rmean <- function(r) Reduce(`+`, lapply(1:nt, function(t) cell(t, r))) / nt
    kr <- function(term, L) { k <- KRmodcomp(lmm, L)$test; list(term = term, numDf = k["Ftest", "ndf"], denDf = k["Ftest", "ddf"], f = k["Ftest", "stat"], p = k["Ftest", "p.value"]) }
    result$kenwardRoger <- list(
      kr("treatment", do.call(rbind, lapply(2:nt, function(t) tmean(t) - tmean(1)))),
      kr("round", do.call(rbind, lapply(2:nr, function(r) rmean(r) - rmean(1)))),
      kr("treatment:round", do.call(rbind, unlist(lapply(2:nt, function(t) lapply(2:nr, function(r) cell(t, r) - cell(1, r) - cell(t, 1) + cell(1, 1))), recursive = FALSE))))
    result$byRound <- lapply(1:nr, function(r) c(list(round = rounds[r]), kr("treatment", do.call(rbind, lapply(2:nt, function(t) cell(t, r) - cell(1, r))))))
    result$krMeans <- lapply(seq_len(nrow(es)), function(i) list(treatment = as.character(es$treatment[i]), round = as.character(es$round[i]), mean = es$emmean[i], se = es$SE[i], df = es$df[i]))
    result$lmerLogLik <- as.numeric(logLik(lmm))
  }
  # The classical split plot in time on complete plots: car::Anova on the wide table (type II).
  wide <- reshape(d[, c("plot", "round", "value")], idvar = "plot", timevar = "round", direction = "wide")
  wide <- wide[complete.cases(wide), ]
  between <- d[match(wide$plot, d$plot), ]
  Y <- as.matrix(wide[, paste0("value.", rounds)])
  bformula <- as.formula(paste("Y ~", switch(case$design, crd = "treatment", rcbd = "blk + treatment", "multisite-rcbd" = "site + site:block + treatment")))
  mlm <- lm(bformula, data = between)
  a <- Anova(mlm, idata = data.frame(round = factor(rounds, levels = rounds)), idesign = ~ round, type = 2)
  s <- suppressWarnings(summary(a, multivariate = FALSE))
  u <- s$univariate.tests
  result$splitPlot <- lapply(rownames(u)[-1], function(term) list(term = term, ss = u[term, "Sum Sq"], df = u[term, "num Df"], errorSs = u[term, "Error SS"], errorDf = u[term, "den Df"], f = u[term, "F value"], p = u[term, "Pr(>F)"]))
  if (length(rounds) > 2) {
    result$sphericity <- list(mauchlyW = unname(s$sphericity.tests[1, 1]), p = unname(s$sphericity.tests[1, 2]),
      greenhouseGeisser = unname(s$pval.adjustments[1, "GG eps"]), huynhFeldt = unname(s$pval.adjustments[1, "HF eps"]))
    result$corrected <- lapply(rownames(s$pval.adjustments), function(term) list(term = term, pGreenhouseGeisser = unname(s$pval.adjustments[term, "Pr(>F[GG])"]), pHuynhFeldt = unname(s$pval.adjustments[term, "Pr(>F[HF])"])))
  }
  result
}

analyse_ancova <- function(case) {
  obs <- case$observations
  d <- case_frame(case)
  d$value <- as.numeric(column(obs, "value"))
  d$x <- as.numeric(column(obs, "covariate"))
  terms <- switch(case$design, crd = "x + treatment", rcbd = "blk + x + treatment", "multisite-rcbd" = "site + site:block + x + treatment + site:treatment")
  # keep.order: R would otherwise move site:block behind the covariate and treatment.
  m <- lm(terms(as.formula(paste("value ~", terms)), keep.order = TRUE), data = d)
  a <- anova(m)
  rows <- lapply(seq_len(nrow(a) - 1), function(i) list(term = trimws(rownames(a)[i]), df = a$Df[i], ss = a[["Sum Sq"]][i], f = a[["F value"]][i], p = a[["Pr(>F)"]][i]))
  # The covariate adjusted for every other term (type II), as textbook ANCOVA tables give the regression.
  dx <- drop1(m, scope = ~ x, test = "F")
  rows[[which(vapply(rows, function(r) r$term == "x", TRUE))]] <- list(term = "x", df = dx$Df[2], ss = dx[["Sum of Sq"]][2], f = dx[["F value"]][2], p = dx[["Pr(>F)"]][2])
  emm <- if (case$design == "multisite-rcbd") emmeans(m, ~ treatment, nesting = "block %in% site") else emmeans(m, ~ treatment)
  es <- as.data.frame(summary(emm))
  tukey <- as.data.frame(summary(pairs(emm, adjust = "tukey")))
  slopes <- anova(m, update(m, . ~ . + x:treatment))
  base <- switch(case$design, crd = "1", rcbd = "blk", "multisite-rcbd" = "site + site:block")
  baseline <- anova(lm(as.formula(paste("x ~", base)), data = d), lm(as.formula(paste("x ~", base, "+ treatment")), data = d))
  co <- summary(m)$coefficients["x", ]
  list(anova = rows, errorDf = df.residual(m), errorSs = deviance(m),
    means = lapply(seq_len(nrow(es)), function(i) list(treatment = as.character(es$treatment[i]), mean = es$emmean[i], se = es$SE[i])),
    tukeyP = unname(tukey$p.value), slopes = list(f = slopes$F[2], p = slopes[["Pr(>F)"]][2], df1 = slopes$Df[2]),
    baseline = list(f = baseline$F[2], p = baseline[["Pr(>F)"]][2]), slope = list(estimate = unname(co[1]), se = unname(co[2]), t = unname(co[3]), p = unname(co[4])),
    standardizedResiduals = unname(rstandard(m)))
}

analyse <- function(case) switch(case$family, ancova = analyse_ancova(case), repeated = analyse_repeated(case), censored = analyse_censored(case), ordinal = analyse_ordinal(case), counts = analyse_counts(case))

results <- lapply(cases, analyse)
versions <- sapply(c("survival", "nlme", "emmeans", "MASS", "car", "multcomp"), function(p) tryCatch(as.character(packageVersion(p)), error = function(e) NA))
writeLines(toJSON(list(r = list(version = R.version.string, packages = as.list(versions)), cases = results), auto_unbox = TRUE, digits = I(17), na = "null", null = "null"), args[2])
