# Reference analyses for src/r-design-reference.test.ts, called by generate-r-design-fixtures.mjs:
#   Rscript generate-r-design-fixtures.R cases.json results.json
# Balanced classical cases: aov with Error() strata. Unbalanced least-squares cases: car::Anova(type = 3) with
# contr.sum. REML cases: lmer (blocks, whole plots, sub plots random; sites and site × each factor term random)
# with Kenward–Roger type III tests from pbkrtest::KRmodcomp and least-squares means from emmeans (Kenward–Roger),
# and the same fit's Satterthwaite tests and means from lmerTest (anova(as_lmerModLmerTest(m), type = 3,
# ddf = "Satterthwaite")) and emmeans(lmer.df = "satterthwaite").
suppressPackageStartupMessages({ library(jsonlite); library(lme4); library(pbkrtest); library(emmeans); library(car) })
emm_options(msg.nesting = FALSE, msg.interaction = FALSE, lmer.df = "kenward-roger", lmerTest.limit = 1e6, pbkrtest.limit = 1e6)
options(contrasts = c("contr.sum", "contr.poly"))
args <- commandArgs(trailingOnly = TRUE)
cases <- fromJSON(args[1], simplifyVector = FALSE)

frame <- function(case) {
  obs <- case$observations
  get <- function(f) vapply(obs, function(o) if (is.null(o[[f]])) NA_character_ else as.character(o[[f]]), "")
  d <- data.frame(y = vapply(obs, function(o) as.numeric(o$value), 0))
  for (name in unlist(case$factorNames)) d[[name]] <- factor(vapply(obs, function(o) o$factors[[name]], ""), levels = unique(vapply(obs, function(o) o$factors[[name]], "")))
  if (!all(is.na(get("block")))) d$block <- factor(get("block"), levels = unique(get("block")))
  if (!all(is.na(get("site")))) d$site <- factor(get("site"), levels = unique(get("site")))
  d
}

term_means <- function(m, names, df = "kenward-roger") {
  sets <- unlist(lapply(seq_along(names), function(k) combn(names, k, simplify = FALSE)), recursive = FALSE)
  lapply(sets, function(set) {
    e <- as.data.frame(emmeans(m, set, lmer.df = df))
    list(term = paste(set, collapse = ":"), means = lapply(seq_len(nrow(e)), function(i) list(
      levels = as.list(setNames(vapply(set, function(f) as.character(e[[f]][i]), ""), set)), mean = e$emmean[i], se = e$SE[i], df = e$df[i])))
  })
}

analyse <- function(case) {
  d <- frame(case)
  names <- unlist(case$factorNames)
  fixed <- paste(names, collapse = " * ")
  multisite <- !is.null(d$site)
  split <- switch(case$design, "split-plot" = 1, "multisite-split-plot" = 1, "split-split-plot" = 2, 0)
  if (case$model == "anova" && split == 0 && is.null(d$block) == FALSE && nrow(d) == nlevels(d$block) * prod(sapply(names, function(n) nlevels(d[[n]])))) {
    a <- summary(aov(as.formula(paste("y ~ block +", fixed)), data = d))[[1]]
    rows <- lapply(seq_len(nrow(a)), function(i) list(term = trimws(rownames(a)[i]), df = a$Df[i], ss = a[["Sum Sq"]][i], f = if (is.na(a[["F value"]][i])) NULL else a[["F value"]][i]))
    m <- lm(as.formula(paste("y ~ block +", fixed)), data = d)
    return(list(kind = "aov", rows = rows, means = term_means(m, names)))
  }
  if (case$model == "anova" && split == 1) {
    s <- summary(aov(as.formula(paste("y ~", fixed, "+ Error(block/", names[1], ")")), data = d))
    rows <- unname(unlist(lapply(s, function(stratum) { a <- stratum[[1]]; lapply(seq_len(nrow(a)), function(i) list(term = trimws(rownames(a)[i]), df = a$Df[i], ss = a[["Sum Sq"]][i], f = if (is.na(a[["F value"]][i])) NULL else a[["F value"]][i])) }), recursive = FALSE))
    return(list(kind = "aov-strata", rows = rows))
  }
  if (case$model == "anova") {
    m <- lm(as.formula(paste("y ~", if (is.null(d$block)) "" else "block +", fixed)), data = d)
    a <- Anova(m, type = 3)
    keep <- setdiff(rownames(a), "(Intercept)")
    rows <- lapply(keep, function(t) list(term = if (t == "Residuals") "error" else t, df = a[t, "Df"], ss = a[t, "Sum Sq"], f = if (is.na(a[t, "F value"])) NULL else a[t, "F value"], p = if (is.na(a[t, "Pr(>F)"])) NULL else a[t, "Pr(>F)"]))
    return(list(kind = "type3", rows = rows, means = term_means(m, names)))
  }
  random <- c()
  if (multisite) random <- c(random, "(1|site)", sapply(unlist(lapply(seq_along(names), function(k) combn(names, k, simplify = FALSE)), recursive = FALSE), function(set) paste0("(1|site:", paste(set, collapse = ":"), ")")))
  if (!is.null(d$block)) random <- c(random, if (multisite) "(1|site:block)" else "(1|block)")
  if (split >= 1) random <- c(random, paste0("(1|", if (multisite) "site:" else "", "block:", names[1], ")"))
  if (split >= 2) random <- c(random, paste0("(1|block:", names[1], ":", names[2], ")"))
  f <- as.formula(paste("y ~", fixed, "+", paste(random, collapse = " + ")))
  m <- lmer(f, data = d, control = lmerControl(optimizer = "bobyqa", optCtrl = list(maxfun = 1e5), check.conv.singular = "ignore"))
  # Type III with contr.sum and every cell present: a term's hypothesis is "its coefficients are 0" (KRmodcomp).
  X <- getME(m, "X")
  assign <- attr(X, "assign")
  labels <- attr(terms(m), "term.labels")
  tests <- lapply(seq_along(labels), function(k) {
    L <- diag(ncol(X))[assign == k, , drop = FALSE]
    kr <- KRmodcomp(m, L)$test
    list(term = labels[k], numDf = kr["Ftest", "ndf"], denDf = kr["Ftest", "ddf"], f = kr["Ftest", "stat"], p = kr["Ftest", "p.value"])
  })
  # Satterthwaite on the same fit (lmerTest refits nothing: as_lmerModLmerTest adds the derivatives it needs).
  a <- anova(lmerTest::as_lmerModLmerTest(m), type = 3, ddf = "Satterthwaite")
  satterthwaite <- list(
    call = "anova(lmerTest::as_lmerModLmerTest(m), type = 3, ddf = \"Satterthwaite\"); emmeans(m, set, lmer.df = \"satterthwaite\")",
    tests = lapply(rownames(a), function(t) list(term = t, numDf = a[t, "NumDF"], denDf = a[t, "DenDF"], f = a[t, "F value"], p = a[t, "Pr(>F)"])),
    means = term_means(m, names, "satterthwaite"))
  vc <- as.data.frame(VarCorr(m))
  list(kind = "reml", formula = paste(deparse(f), collapse = ""), tests = tests, means = term_means(m, names), satterthwaite = satterthwaite,
    varianceComponents = lapply(seq_len(nrow(vc)), function(i) list(name = vc$grp[i], variance = vc$vcov[i])))
}

out <- list(r = list(version = R.version.string, lme4 = as.character(packageVersion("lme4")), pbkrtest = as.character(packageVersion("pbkrtest")),
  emmeans = as.character(packageVersion("emmeans")), car = as.character(packageVersion("car")), lmerTest = as.character(packageVersion("lmerTest"))), cases = lapply(cases, analyse))
writeLines(toJSON(out, auto_unbox = TRUE, digits = NA, null = "null"), args[2])
