# Reference values for the REML core tests (libs/stats/src/reml/*.test.ts), printed to 12+ digits:
#   Rscript libs/stats/scripts/reml-core-reference.R
# Needs Debian's r-cran-lme4, r-cran-lmertest, r-cran-pbkrtest, r-cran-emmeans, r-cran-nlme.
# lme4 is run to a tight optimum (nloptwrap with xtol_abs 1e-12) so that the values are the REML optimum
# to about 1e-9, not to lme4's default stopping rule.
suppressMessages({library(lme4); library(lmerTest); library(pbkrtest); library(emmeans)})
options(contrasts = c("contr.sum", "contr.poly"), digits = 15)
ctrl <- lmerControl(optimizer = "nloptwrap", optCtrl = list(xtol_abs = 1e-12, ftol_abs = 1e-14, xtol_rel = 1e-12))
here <- dirname(sub("--file=", "", grep("--file=", commandArgs(FALSE), value = TRUE)))
oats <- read.csv(file.path(here, "../../../datasets/reference/nlme-oats.csv"))
oats <- oats[-c(3, 17, 40, 41, 66), ]  # five plots missing
oats$Block <- factor(oats$Block, levels = unique(oats$Block))
oats$Variety <- factor(oats$Variety, levels = unique(oats$Variety))
oats$nitro <- factor(oats$nitro)

cat("== Oats split plot, 5 plots missing: lmer(yield ~ Variety*nitro + (1|Block) + (1|Block:Variety))\n")
m <- lmer(yield ~ Variety * nitro + (1 | Block) + (1 | Block:Variety), data = oats, control = ctrl)
print(logLik(m))
print(as.data.frame(VarCorr(m))[, c("grp", "vcov")])
print(fixef(m))
print(nlme::lme(yield ~ Variety * nitro, random = ~ 1 | Block / Variety, data = oats, method = "REML")$logLik)
print(as.data.frame(anova(m, type = 3, ddf = "Kenward-Roger"))[, c("NumDF", "DenDF", "F value", "Pr(>F)")])
print(as.data.frame(anova(m, type = 3, ddf = "Satterthwaite"))[, c("NumDF", "DenDF", "F value", "Pr(>F)")])
print(as.data.frame(summary(emmeans(m, ~ Variety, lmer.df = "kenward-roger"))))
print(as.data.frame(summary(emmeans(m, ~ nitro, lmer.df = "satterthwaite"))))
print(as.data.frame(summary(pairs(emmeans(m, ~ Variety, lmer.df = "kenward-roger"), adjust = "none"))))

cat("== RCBD, 4 treatments x 4 blocks, plots 6 and 11 missing: lmer(y ~ trt + (1|block))\n")
r <- data.frame(block = factor(rep(1:4, each = 4)), trt = factor(rep(c("A", "B", "C", "D"), 4)),
  y = c(12.1, 14.3, 13.0, 15.8, 11.2, 13.9, 12.4, 15.1, 13.5, 15.2, 14.1, 16.9, 12.0, 13.1, 12.2, 15.5))[-c(6, 11), ]
mr <- lmer(y ~ trt + (1 | block), data = r, control = ctrl)
print(logLik(mr)); print(as.data.frame(VarCorr(mr))[, c("grp", "vcov")]); print(fixef(mr))
print(as.data.frame(anova(mr, type = 3, ddf = "Kenward-Roger"))[, c("NumDF", "DenDF", "F value", "Pr(>F)")]); print(as.data.frame(anova(mr, type = 3, ddf = "Satterthwaite"))[, c("NumDF", "DenDF", "F value", "Pr(>F)")])

cat("== Boundary: 3 treatments x 4 blocks, plot 5 missing, block variance estimated at 0\n")
b <- data.frame(block = factor(rep(1:4, each = 3)), trt = factor(rep(c("A", "B", "C"), 4)),
  y = c(10.2, 11.9, 12.8, 11.1, 11.0, 13.3, 9.8, 12.6, 12.1, 10.9, 11.4, 13.0))[-5, ]
mb <- suppressMessages(lmer(y ~ trt + (1 | block), data = b, control = ctrl))
print(logLik(mb)); print(as.data.frame(VarCorr(mb))[, c("grp", "vcov")])
print(as.data.frame(anova(mb, type = 3, ddf = "Kenward-Roger"))[, c("NumDF", "DenDF", "F value", "Pr(>F)")]); print(as.data.frame(anova(mb, type = 3, ddf = "Satterthwaite"))[, c("NumDF", "DenDF", "F value", "Pr(>F)")])
