import type { FindingsAnalysis } from '@friable/contracts';

/** What the script needs to know beside data.csv: the analysis, the engine's request, and a title. */
export interface ScriptInput {
  analysis: FindingsAnalysis;
  /** The stateless endpoint's body without observations (design, control, distribution, covariance, family, transform…). */
  request: Record<string, unknown>;
  title: string;
  /** Factorial and split designs: the engine's model ('reml' for unbalanced data), from the answer. */
  modelKind?: 'anova' | 'reml';
}

const rString = (text: string) => JSON.stringify(text);

/** The header every script shares: reading data.csv with the engine's treatment order and the design's blocks. */
function preamble(input: ScriptInput, packages: string[]): string {
  const design = String(input.request.design);
  const control = typeof input.request.control === 'string' ? input.request.control : null;
  return `# ${input.title}
# Reproduces Friable's tables from data.csv with R's standard packages. Run: Rscript analysis.R
# The numbers are written to r-results.json beside friable.json (Friable's own answer) for comparison.
suppressMessages({ ${['jsonlite', ...packages].map((p) => `library(${p})`).join('; ')} })
d <- read.csv("data.csv", colClasses = "character", check.names = FALSE)
d$value <- as.numeric(d$value)
d$treatment <- factor(d$treatment, levels = unique(d$treatment))
${control ? `d$treatment <- relevel(d$treatment, ref = ${rString(control)})\n` : ''}design <- ${rString(design)}
if (design == "multisite-rcbd") {
  d$site <- factor(d$site, levels = unique(d$site))
  d$block <- factor(d$block, levels = unique(d$block))
  blocks <- "site + site:block"
} else if (design == "rcbd") {
  d$block <- factor(d$block, levels = unique(d$block))
  blocks <- "block"
} else {
  blocks <- NULL
}
with_blocks <- function(...) as.formula(paste(c(...)[1], "~", paste(c(blocks, c(...)[-1]), collapse = " + ")))
# Sequential sums of squares in Friable's order (R would otherwise move interactions such as site:block last).
in_order <- function(formula) terms(formula, keep.order = TRUE)
results <- list()
`;
}

const finish = `write_json(results, "r-results.json", digits = NA, auto_unbox = TRUE, pretty = TRUE)
print(results)
`;

function anovaScript(input: ScriptInput): string {
  const transform = String(input.request.transform ?? 'none');
  const sitesAre = input.request.sitesAre === 'fixed' ? 'fixed' : 'random';
  const method = Array.isArray(input.request.meanSeparation) ? String(input.request.meanSeparation[0]) : 'tukey';
  const adjust: Record<string, string> = { tukey: 'tukey', lsd: 'none', bonferroni: 'bonferroni', holm: 'holm', dunnett: 'dunnett' };
  const covariate = input.analysis === 'ancova';
  return `${preamble(input, ['emmeans'])}${
    covariate
      ? `# Analysis of covariance: blocks, the baseline (covariate) adjusted for them, treatment adjusted for the baseline.
d$covariate <- as.numeric(d$covariate)
fit <- lm(in_order(with_blocks("value", "covariate", "treatment")), data = d)
table <- anova(fit)
# The covariate's row is adjusted for every other term (treatment included), as drop1 gives it.
adjusted <- drop1(fit, test = "F")
table["covariate", c("Sum Sq", "F value", "Pr(>F)")] <- adjusted["covariate", c("Sum of Sq", "F value", "Pr(>F)")]
results$anova <- data.frame(term = rownames(table), df = table$Df, ss = table[["Sum Sq"]], f = table[["F value"]], p = table[["Pr(>F)"]])
results$slope <- unname(coef(fit)["covariate"])
slopes <- anova(fit, lm(in_order(with_blocks("value", "covariate", "treatment", "covariate:treatment")), data = d))
results$slopes <- list(f = slopes$F[2], p = slopes[["Pr(>F)"]][2])
baseline <- anova(lm(in_order(with_blocks("covariate", "treatment")), data = d))
results$baseline <- list(f = baseline["treatment", "F value"], p = baseline["treatment", "Pr(>F)"])
`
      : `d$value <- switch(${rString(transform)}, none = d$value, log = log(d$value), sqrt = sqrt(d$value), "arcsine-sqrt" = asin(sqrt(d$value)))
if (design == "multisite-rcbd") {
  fit <- lm(in_order(value ~ site + site:block + treatment + site:treatment), data = d)
} else {
  fit <- lm(in_order(with_blocks("value", "treatment")), data = d)
}
table <- anova(fit)
${
  sitesAre === 'random'
    ? `if (design == "multisite-rcbd") {
  # Sites random: treatment is tested against site × treatment, site against blocks within sites.
  table["treatment", "F value"] <- table["treatment", "Mean Sq"] / table["site:treatment", "Mean Sq"]
  table["treatment", "Pr(>F)"] <- pf(table["treatment", "F value"], table["treatment", "Df"], table["site:treatment", "Df"], lower.tail = FALSE)
  table["site", "F value"] <- table["site", "Mean Sq"] / table["site:block", "Mean Sq"]
  table["site", "Pr(>F)"] <- pf(table["site", "F value"], table["site", "Df"], table["site:block", "Df"], lower.tail = FALSE)
}
`
    : ''
}results$anova <- data.frame(term = rownames(table), df = table$Df, ss = table[["Sum Sq"]], f = table[["F value"]], p = table[["Pr(>F)"]])
`
  }means <- emmeans(fit, ~ treatment)
print(means)
results$means <- as.data.frame(summary(means))[, c("treatment", "emmean", "SE")]
print(pairs(means, adjust = ${rString(adjust[method] ?? 'tukey')}))
${finish}`;
}

const FACTOR_DESIGNS = ['factorial-crd', 'factorial-rcbd', 'split-plot', 'split-split-plot'];

/**
 * The classical ANOVA of a factorial (in blocks or not) or a split / split-split plot at one site, as R's aov gives it:
 * a split plot's terms in their error strata (Error(block/A) or Error(block/A/B)), each stratum's residual named as
 * Friable names it ('block', 'block:A', 'block:A:B', 'error'); each factor's level means by emmeans on the fixed model.
 */
function factorScript(input: ScriptInput): string {
  const factorNames = (input.request.factorNames as string[] | undefined) ?? [];
  const transform = String(input.request.transform ?? 'none');
  // The control is a combination of levels here, not a treatment code of data.csv: no reference level to set.
  return `${preamble({ ...input, request: { ...input.request, control: undefined } }, ['emmeans'])}factor_names <- c(${factorNames.map(rString).join(', ')})
for (name in factor_names) d[[name]] <- factor(d[[name]], levels = unique(d[[name]]))
if (!is.null(d$block)) d$block <- factor(d$block, levels = unique(d$block))
quoted <- function(names) paste0("\`", names, "\`")
plain <- function(labels) gsub("\`", "", trimws(labels))
effects <- paste(quoted(factor_names), collapse = " * ")
d$value <- switch(${rString(transform)}, none = d$value, log = log(d$value), sqrt = sqrt(d$value), "arcsine-sqrt" = asin(sqrt(d$value)))
row_table <- function(tab, residual) {
  terms <- plain(rownames(tab))
  terms[terms == "Residuals"] <- residual
  data.frame(term = terms, df = tab$Df, ss = tab[["Sum Sq"]], f = tab[["F value"]], p = tab[["Pr(>F)"]])
}
if (design %in% c("split-plot", "split-split-plot")) {
  # Whole plots (and sub plots) are the error strata: Error(block/A) or Error(block/A/B).
  nesting <- paste(c("block", quoted(factor_names[seq_len(if (design == "split-plot") 1 else 2)])), collapse = "/")
  fit <- aov(as.formula(paste("value ~", effects, "+ Error(", nesting, ")")), data = d)
  strata <- summary(fit)
  print(strata)
  tables <- lapply(names(strata), function(stratum) {
    name <- plain(sub("^Error: ", "", stratum))
    row_table(strata[[stratum]][[1]], if (name == "Within") "error" else name)
  })
  results$anova <- do.call(rbind, tables)
  # Blocks tested against the whole-plot error, as the textbook table has it (aov leaves the block stratum untested).
  mean_square <- function(name) { row <- results$anova[results$anova$term == name, ]; row$ss / row$df }
  whole_plot_error <- paste0("block:", factor_names[1])
  block_row <- results$anova$term == "block"
  block_f <- mean_square("block") / mean_square(whole_plot_error)
  results$anova$f[block_row] <- block_f
  results$anova$p[block_row] <- pf(block_f, results$anova$df[block_row], results$anova$df[results$anova$term == whole_plot_error], lower.tail = FALSE)
  fixed <- lm(as.formula(paste("value ~ block +", effects)), data = d)
  if (design == "split-plot") {
    # Standard errors of the four kinds of difference, as the agricultural-experiment textbooks give them (Gomez & Gomez 1984, 2nd ed., the split-plot design; section cited from memory): Ea whole-plot, Eb sub-plot error.
    ea <- mean_square(whole_plot_error)
    eb <- mean_square("error")
    r <- nlevels(d$block); a <- nlevels(d[[factor_names[1]]]); b <- nlevels(d[[factor_names[2]]])
    results$differences <- data.frame(
      kind = c(factor_names[1], factor_names[2], paste(factor_names[2], "within", factor_names[1]), paste(factor_names[1], "within", factor_names[2])),
      se = c(sqrt(2 * ea / (r * b)), sqrt(2 * eb / (r * a)), sqrt(2 * eb / r), sqrt(2 * ((b - 1) * eb + ea) / (r * b)))
    )
  }
} else {
  fixed <- lm(as.formula(paste("value ~", if (design == "factorial-rcbd") "block +" else "", effects)), data = d)
  table <- anova(fixed)
  print(table)
  results$anova <- row_table(table, "error")
}
# Each factor's level means (balanced data: the same whatever the error strata).
results$factorMeans <- do.call(rbind, lapply(factor_names, function(name) {
  means <- as.data.frame(summary(emmeans(fixed, as.formula(paste("~", quoted(name))))))
  data.frame(term = name, level = as.character(means[[1]]), emmean = means$emmean)
}))
print(results$factorMeans)
${finish}`;
}

const MULTISITE_FACTOR_DESIGNS = ['multisite-factorial-rcbd', 'multisite-split-plot'];

/**
 * A factorial or split plot fitted by REML (unbalanced data, or several sites with sites random), as lme4 fits it:
 * blocks, whole plots and sub plots random, and with several sites the site and its interaction with every factor term
 * random; Kenward–Roger type III tests (pbkrtest::KRmodcomp on sum-to-zero contrasts) or Satterthwaite's (lmerTest),
 * and each factor's least-squares means by emmeans.
 */
function remlScript(input: ScriptInput): string {
  const factorNames = (input.request.factorNames as string[] | undefined) ?? [];
  const transform = String(input.request.transform ?? 'none');
  const satterthwaite = input.request.ddf === 'satterthwaite';
  return `${preamble({ ...input, request: { ...input.request, control: undefined } }, ['lme4', 'pbkrtest', 'lmerTest', 'emmeans'])}options(contrasts = c("contr.sum", "contr.poly"))
emm_options(lmer.df = ${rString(satterthwaite ? 'satterthwaite' : 'kenward-roger')}, pbkrtest.limit = 1e6, lmerTest.limit = 1e6)
factor_names <- c(${factorNames.map(rString).join(', ')})
for (name in factor_names) d[[name]] <- factor(d[[name]], levels = unique(d[[name]]))
if (!is.null(d$block)) d$block <- factor(d$block, levels = unique(d$block))
multisite <- !is.null(d$site) && length(unique(d$site)) > 1
if (multisite) d$site <- factor(d$site, levels = unique(d$site))
quoted <- function(names) paste0("\`", names, "\`")
plain <- function(labels) gsub("\`", "", trimws(labels))
d$value <- switch(${rString(transform)}, none = d$value, log = log(d$value), sqrt = sqrt(d$value), "arcsine-sqrt" = asin(sqrt(d$value)))
split <- switch(design, "split-plot" = 1, "multisite-split-plot" = 1, "split-split-plot" = 2, 0)
# Random terms: sites and site × every factor term (several sites), blocks (within sites), whole plots, sub plots.
random <- c()
if (multisite) {
  sets <- unlist(lapply(seq_along(factor_names), function(k) combn(factor_names, k, simplify = FALSE)), recursive = FALSE)
  random <- c("(1 | site)", sapply(sets, function(set) paste0("(1 | site:", paste(quoted(set), collapse = ":"), ")")))
}
if (!is.null(d$block)) random <- c(random, if (multisite) "(1 | site:block)" else "(1 | block)")
if (split >= 1) random <- c(random, paste0("(1 | ", if (multisite) "site:" else "", "block:", quoted(factor_names[1]), ")"))
if (split >= 2) random <- c(random, paste0("(1 | block:", quoted(factor_names[1]), ":", quoted(factor_names[2]), ")"))
model_formula <- as.formula(paste("value ~", paste(quoted(factor_names), collapse = " * "), "+", paste(random, collapse = " + ")))
fit <- lmer(model_formula, data = d, control = lmerControl(optimizer = "bobyqa", optCtrl = list(maxfun = 1e5), check.conv.singular = "ignore"))
print(summary(fit))
${
  satterthwaite
    ? `table <- anova(as_lmerModLmerTest(fit), type = 3, ddf = "Satterthwaite")
print(table)
results$anova <- data.frame(term = plain(rownames(table)), numDf = table$NumDF, denDf = table$DenDF, f = table[["F value"]], p = table[["Pr(>F)"]])
`
    : `# Type III with sum-to-zero contrasts: a term's hypothesis is "its coefficients are 0", tested by Kenward–Roger.
X <- getME(fit, "X")
assign <- attr(X, "assign")
labels <- attr(terms(fit), "term.labels")
results$anova <- do.call(rbind, lapply(seq_along(labels), function(k) {
  test <- KRmodcomp(fit, diag(ncol(X))[assign == k, , drop = FALSE])$test
  data.frame(term = plain(labels[k]), numDf = test["Ftest", "ndf"], denDf = test["Ftest", "ddf"], f = test["Ftest", "stat"], p = test["Ftest", "p.value"])
}))
print(results$anova)
`
}results$varianceComponents <- as.data.frame(VarCorr(fit))[, c("grp", "vcov")]
results$factorMeans <- do.call(rbind, lapply(factor_names, function(name) {
  means <- as.data.frame(summary(emmeans(fit, as.formula(paste("~", quoted(name))))))
  data.frame(term = name, level = as.character(means[[1]]), emmean = means$emmean, se = means$SE)
}))
print(results$factorMeans)
${finish}`;
}

function censoredScript(input: ScriptInput): string {
  return `${preamble(input, ['survival', 'multcomp'])}d$drained <- d$censored != "true"
# Not-drained curves (product-limit, log-scale 95 % limits) and medians.
curves <- survfit(Surv(value, drained) ~ treatment, data = d, conf.type = "log")
print(quantile(curves, 0.5))
# Log-rank test stratified by block (site × block with several sites).
logrank <- if (design == "multisite-rcbd") survdiff(Surv(value, drained) ~ treatment + strata(site, block), data = d) else if (design == "rcbd") survdiff(Surv(value, drained) ~ treatment + strata(block), data = d) else survdiff(Surv(value, drained) ~ treatment, data = d)
results$logRank <- list(chiSquare = logrank$chisq, df = length(logrank$n) - 1)
# Time-ratio (accelerated-failure-time) model with the design's blocks; each term dropped by likelihood ratio.
fit <- survreg(with_blocks("Surv(value, drained)", "treatment"), data = d, dist = ${rString(String(input.request.distribution ?? 'weibull'))})
tests <- drop1(fit, test = "Chisq")
print(tests)
results$treatmentTest <- list(df = tests["treatment", "Df"], chiSquare = tests["treatment", "LRT"], p = tests["treatment", "Pr(>Chi)"])
results$logLik <- as.numeric(logLik(fit))
results$scale <- fit$scale
# Time ratios to the control with simultaneous (single-step, Dunnett-type) 95 % limits.
# (glht on the treatment coefficients and their covariance: each is a treatment's log time ratio to the control.)
treatments <- grep("^treatment", names(coef(fit)), value = TRUE)
contrasts <- diag(length(treatments))
rownames(contrasts) <- sub("^treatment", "", treatments)
ratios <- glht(parm(coef(fit)[treatments], vcov(fit)[treatments, treatments]), linfct = contrasts)
limits <- exp(confint(ratios)$confint)
results$timeRatios <- data.frame(treatment = rownames(limits), ratio = limits[, "Estimate"], lower = limits[, "lwr"], upper = limits[, "upr"])
${finish}`;
}

function repeatedScript(input: ScriptInput): string {
  return `${preamble(input, ['nlme', 'emmeans'])}d$time <- as.numeric(d$time)
d$round <- factor(d$round, levels = unique(d$round[order(d$time)]))
d$plot <- factor(paste(d$site, d$block, d$treatment))
# The within-plot covariance Friable chose (friable.json, covariance.structure), fitted by REML.
# (Built at the top level: emmeans re-reads the call, so every name in it must be found here.)
friable <- fromJSON("friable.json")
structure <- friable$covariance$structure
model_formula <- with_blocks("value", "treatment * round")
correlation <- switch(structure, cs = corCompSymm(form = ~ 1 | plot), ar1 = corCAR1(form = ~ time | plot), unstructured = corSymm(form = ~ as.integer(round) | plot))
fit <- if (structure == "unstructured") {
  gls(model_formula, data = d, correlation = correlation, weights = varIdent(form = ~ 1 | round), method = "REML")
} else {
  gls(model_formula, data = d, correlation = correlation, method = "REML")
}
results$structure <- friable$covariance$structure
results$logLik <- as.numeric(logLik(fit))
print(anova(fit, type = "marginal"))
means <- emmeans(fit, ~ treatment | round, mode = "df.error", data = d)
print(means)
results$means <- as.data.frame(summary(means))[, c("treatment", "round", "emmean", "SE")]
print(joint_tests(fit, by = "round", mode = "df.error", data = d))
${finish}`;
}

function ordinalScript(input: ScriptInput): string {
  return `${preamble(input, ['MASS'])}d$score <- factor(d$value, levels = sort(unique(d$value)), ordered = TRUE)
# Proportional-odds (cumulative logit) model with the design's blocks; a positive coefficient means higher scores.
fit <- polr(with_blocks("score", "treatment"), data = d, Hess = TRUE)
without <- polr(as.formula(paste("score ~", if (is.null(blocks)) "1" else paste(blocks, collapse = " + "))), data = d, Hess = TRUE)
test <- anova(without, fit)
print(test)
results$treatmentTest <- list(df = test[2, "   Df"], chiSquare = test[2, "LR stat."], p = test[2, "Pr(Chi)"])
results$oddsRatios <- data.frame(treatment = sub("^treatment", "", grep("^treatment", names(coef(fit)), value = TRUE)), ratio = exp(coef(fit)[grep("^treatment", names(coef(fit)))]))
${finish}`;
}

function countsScript(input: ScriptInput): string {
  return `${preamble(input, [])}d$value <- as.integer(d$value)
# Poisson log-linear model with the design's blocks; overdispersion by Pearson's chi-square on the residual df.
poisson_fit <- glm(with_blocks("value", "treatment"), data = d, family = poisson)
pearson <- sum(residuals(poisson_fit, type = "pearson")^2)
results$overdispersion <- list(pearsonChiSquare = pearson, df = df.residual(poisson_fit), p = pchisq(pearson, df.residual(poisson_fit), lower.tail = FALSE))
family_used <- ${rString(String(input.request.family ?? 'auto'))}
if (family_used == "auto") family_used <- if (results$overdispersion$p < 0.05) "quasipoisson" else "poisson"
fit <- if (family_used == "quasipoisson") glm(with_blocks("value", "treatment"), data = d, family = quasipoisson) else poisson_fit
tests <- drop1(fit, test = if (family_used == "quasipoisson") "F" else "Chisq")
print(tests)
results$family <- family_used
results$dispersion <- summary(fit)$dispersion
results$treatmentDeviance <- tests["treatment", "Deviance"]
results$rateRatios <- data.frame(treatment = sub("^treatment", "", grep("^treatment", names(coef(fit)), value = TRUE)), ratio = exp(coef(fit)[grep("^treatment", names(coef(fit)))]))
${finish}`;
}

/**
 * R script — the script in a Findings bundle that reproduces the analysis from its data.csv with R's standard
 * packages (stats, emmeans, survival, multcomp, nlme, MASS), printing the tables and writing r-results.json.
 * One-factor designs (crd, rcbd, several sites combined) for every analysis; the classical ANOVA of a factorial or a
 * split / split-split plot at one site; their REML fits (unbalanced data, or several sites taken as random) with lme4
 * and Kenward–Roger or Satterthwaite tests; a combined factorial or split plot whose blocks are fixed, or whose sites
 * are fixed, says plainly that it is not covered.
 * Throws: nothing.
 * Example: rScript({ analysis: 'counts', request: { design: 'rcbd', control: 'C' }, title: '…' }) → "# …\nsuppressMessages({ library(jsonlite) })\n…"
 */
export function rScript(input: ScriptInput): string {
  const design = String(input.request.design);
  const sitesRandom = input.request.sitesAre !== 'fixed';
  if (input.analysis === 'anova' && FACTOR_DESIGNS.includes(design) && input.modelKind !== 'reml') return factorScript(input);
  if (input.analysis === 'anova' && input.modelKind === 'reml' && (FACTOR_DESIGNS.includes(design) || (MULTISITE_FACTOR_DESIGNS.includes(design) && sitesRandom)) && design !== 'factorial-crd') {
    return remlScript(input);
  }
  if (!['crd', 'rcbd', 'multisite-rcbd'].includes(design)) {
    const why = sitesRandom ? 'combined over sites with its blocks fixed (every plot present)' : 'combined over sites taken as fixed';
    return `# ${input.title}\n# This ${design} analysis is ${why}; this bundle's script covers factorials and split plots at one site, and their REML fits (also over sites taken as random). Download the bundle of each site.\nstop("not covered: ${design}, ${why}")\n`;
  }
  switch (input.analysis) {
    case 'anova':
    case 'ancova':
      return anovaScript(input);
    case 'censored':
      return censoredScript(input);
    case 'repeated':
      return repeatedScript(input);
    case 'ordinal':
      return ordinalScript(input);
    case 'counts':
      return countsScript(input);
  }
}
