// Generated from the API's OpenAPI document by `npm run api:client` (openapi-typescript). Do not edit:
// change the API's DTO classes, then run `npx tsc -b && npm run api:client`.
export interface paths {
    "/api/auth/login": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Sign in: answers a short-lived bearer token for API clients and sets the httpOnly session cookie browsers use */
        post: operations["AuthController_login"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/logout": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Sign out: ends this session (its token and cookie stop working) */
        post: operations["AuthController_logout"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/logout-all": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Sign out everywhere: ends every session of the account, this one included */
        post: operations["AuthController_logoutAll"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/me": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AuthController_me"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/password": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Change one’s own password (the current one is required); every other session ends */
        post: operations["AuthController_changePassword"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/password-reset": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Forgotten password: e-mails a single-use link APP_URL/reset-password/<token>; the same answer for any address */
        post: operations["AuthController_requestReset"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/password-reset/confirm": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Set a new password from the e-mailed link; every session of the account ends */
        post: operations["AuthController_confirmReset"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/dev/outbox": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["OutboxController_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/health": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["HealthController_check"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/invitations/{token}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["InvitationsController_preview"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/invitations/{token}/accept": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["InvitationsController_accept"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/rates/dose": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["RatesController_dose"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/stats/anova": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * ANOVA, least-squares means, mean separation, letters and diagnostics
         * @description Designs: crd (treatment), rcbd (block, treatment), multisite-rcbd (site, block:site, treatment, site:treatment): sums of squares sequential in that order; with sites random (the default) treatment is tested against site:treatment and site against block:site. factorial-crd, factorial-rcbd, multisite-factorial-rcbd (2–4 factors), split-plot, multisite-split-plot (2 factors, whole-plot first) and split-split-plot (3): factorNames and observations with factors {name: level}; every main effect and interaction (terms are factor names joined by ":" in the order of factorNames). model: anova (classical; each term tested against its stratum error — block:A for the whole-plot factor — or, with random sites, its site interaction; an unbalanced factorial gets the type III least-squares ANOVA) or reml (blocks, whole plots, sites and site interactions random; Kenward–Roger F tests, rows with numDf and denDf, ss and ms null). Default: anova when every plot is present, else reml; the answer says which (model) and why. Each anova row names its errorTerm. The answer adds strata, least-squares means of every term (marginalMeans), each factor compared in its own stratum (factorComparisons), standard errors of a difference by kind (differences: a split plot’s four, with the weighted t where strata mix) and, for significant two-factor interactions, slices with letters inside each.
         */
        post: operations["StatsController_anova"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/stats/censored": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Drain times with a cut-off: not-drained curves, stratified log-rank test and time ratios to the control
         * @description Product-limit curves per treatment with 95 % log-scale bands and medians (null: not reached), per site too; the log-rank test stratified by block (site × block with several sites); an accelerated-failure-time model (weibull, lognormal or loglogistic) with blocks and sites as terms, a likelihood-ratio test of each term by dropping it (a site with its blocks), and time ratios to the control with simultaneous 95 % limits and single-step (Dunnett-type) adjusted p-values. A block where nothing drained is left out of the model; a treatment that never drained leaves the model out (warnings say so).
         */
        post: operations["StatsController_censored"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/stats/counts": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Counts per plot: Poisson log-linear model with blocks, overdispersion check, quasi-Poisson when needed, rate ratios to the control
         * @description A Poisson log-linear model with the design’s blocks and sites; overdispersion judged by Pearson’s χ² on the residual df, and when present (family auto) a quasi-Poisson fit: standard errors × √dispersion, F tests of each term, t-based limits. Rate ratios to the control with simultaneous 95 % limits and single-step adjusted p-values, and the model’s count per plot for each treatment.
         */
        post: operations["StatsController_counts"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/stats/friedman": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Friedman rank test for blocked data (tie-corrected); incomplete blocks are dropped and listed */
        post: operations["StatsController_friedman"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/stats/kruskal": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Kruskal–Wallis rank test (tie-corrected) */
        post: operations["StatsController_kruskal"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/stats/ordinal": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Scores on an ordered scale: proportional-odds model with blocks, odds ratios to the control, predicted shares, rank test
         * @description A cumulative-logit (proportional-odds) model with the design’s blocks and sites; a likelihood-ratio test of each term by dropping it; each treatment’s odds of a higher score against the control with simultaneous 95 % limits and single-step adjusted p-values; the predicted share of each score per treatment averaged over blocks; and the rank test beside it (Friedman with blocks, else Kruskal–Wallis).
         */
        post: operations["StatsController_ordinal"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/stats/power": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Power of an RCBD by the noncentral F distribution, or the blocks needed for a target power
         * @description Noncentrality = sites × blocks × (difference / cv)² / 2: two treatments differ by the difference, the others sit at the grand mean.
         */
        post: operations["StatsController_power"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/stats/repeated": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * One measure over several rounds on the same plots: REML with a within-plot covariance, Kenward–Roger tests, means per round, split plot in time
         * @description Blocks (and sites), treatment, round and treatment × round fitted by REML with compound symmetry, continuous-time AR(1) on the day offsets (unequal spacing honoured) or unstructured covariance — auto: every one that applies, the lowest AIC chosen and shown beside the others; Kenward–Roger F tests of treatment, round and their interaction and of treatment within each round; least-squares means per treatment and round with Kenward–Roger SEs. Beside it the classical split plot in time on the plots seen at every round, with Mauchly’s test and the Greenhouse–Geisser and Huynh–Feldt corrections.
         */
        post: operations["StatsController_repeated"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TrialsController_list"];
        put?: never;
        post: operations["TrialsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TrialsController_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch: operations["TrialsController_update"];
        trace?: never;
    };
    "/api/trials/{trialId}/activity": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["ActivityController_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/amounts": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PlotsController_amounts"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/analyses": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AnalysesController_list"];
        put?: never;
        /** Save this analysis — the classical ANOVA or any model Findings offers (censored, repeated, ancova, ordinal, counts): the choices, the SHA-256 of the data used, the engine version and the full Findings answer, frozen */
        post: operations["AnalysesController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/analyses/{analysisId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AnalysesController_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/analyses/{analysisId}/comments": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AnalysesController_listComments"];
        put?: never;
        post: operations["AnalysesController_addComment"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/analyses/{analysisId}/comments/{commentId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        /** Delete one’s own comment, sending the version read: it shows as deleted, its text kept in history; replies stay */
        delete: operations["AnalysesController_deleteComment"];
        options?: never;
        head?: never;
        /** Edit one’s own comment (the old text kept as "edited"), or mark a thread resolved / open again, sending the version read */
        patch: operations["AnalysesController_updateComment"];
        trace?: never;
    };
    "/api/trials/{trialId}/analyses/{analysisId}/review-requests": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Ask the trial’s reviewers to review a saved analysis: each gets an e-mail with a link to it */
        post: operations["AnalysesController_requestReview"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/analyses/{analysisId}/sign-offs": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Sign off a saved analysis of a locked trial with a short statement (a reviewer; an investigator when the trial has no reviewer) */
        post: operations["AnalysesController_signOff"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/analyses/{analysisId}/sign-offs/{signOffId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        /** The signer withdraws their sign-off with a reason and the version they read: it stays on the record as withdrawn and no longer counts */
        delete: operations["AnalysesController_withdrawSignOff"];
        options?: never;
        head?: never;
        /** The signer amends the statement of their standing sign-off, sending the version they read (the earlier text stays in the activity trail) */
        patch: operations["AnalysesController_amendSignOff"];
        trace?: never;
    };
    "/api/trials/{trialId}/export-dictionary.csv": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The data dictionary of export.csv: column, meaning, type */
        get: operations["ExportsController_dictionary"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/export.csv": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Tidy CSV: one row per stored value (plot × round × measure), text cells safe from spreadsheet formulas */
        get: operations["ExportsController_csv"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/export.xlsx": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Workbook: Protocol, Plot plans, Data, Dictionary and one sheet per saved analysis ("Analysis <id>") */
        get: operations["ExportsController_workbook"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/factors": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FactorsController_list"];
        put: operations["FactorsController_replace"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/findings": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The analysis of one measure and round, at one site or all sites combined: the model made for the measure, or the one asked for
         * @description `analysis` left out: the model made for the measure — censored (a time with a cut-off: POST /api/stats/censored), ordinal (a score: /api/stats/ordinal), counts (a count: /api/stats/counts), and for a measured number ancova (a day-0 baseline and one later round: /api/stats/anova with the baseline as covariate), repeated (two or more rounds: /api/stats/repeated) or else anova. A model answers with the stateless endpoint’s body, `analysis`, and `context` (the request and observations sent, which model and why, the options on offer). `analysis=anova`: the same body as POST /api/stats/anova on the stored decimal text (design from the trial; several sites combined: multisite-rcbd), plus `context`: the observations in the order given to the engine (residual index), censoring, missing values, % of control, the rank test (Friedman for blocked designs, blocks = site × block when sites are combined; Kruskal–Wallis otherwise), the not-drained curve for a time with a cut-off, the means over time and the data hash. Answers are kept until the next write to the trial (through any API instance).
         */
        get: operations["FindingsController_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/findings/bundle": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The same analysis as a small bundle anyone can check: data.csv, analysis.R, friable.json, README.txt
         * @description Takes the query of GET /findings and bundles the very answer GET /findings gives (from the same cache). analysis.R reproduces the tables from data.csv with R’s standard packages (emmeans, survival, multcomp, nlme, MASS) and writes r-results.json beside friable.json, Friable’s own answer. Covered: every analysis of one-factor designs; the classical ANOVA of factorials (2–4 factors, in blocks or not) and of split and split-split plots at one site, with R’s aov error strata.
         */
        get: operations["FindingsController_bundle"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/findings/summary": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The recorded values of one measure and round per treatment, before any model: plots, values, not reached by the cut-off, missing, mean, SD, median, range
         * @description Read without the engine, so it answers at once: Findings shows it while the analysis is computed. Takes measureId, roundId and siteId as GET /findings; the round left out is the one GET /findings would analyse (the latest holding values of the measure in the scope). A censored value counts at its cut-off.
         */
        get: operations["FindingsController_summary"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/intake-columns": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["IntakeImportsController_remembered"];
        put?: never;
        post?: never;
        delete: operations["IntakeImportsController_forget"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/intake-imports": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["IntakeImportsController_recent"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/intake-imports/{ticket}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["IntakeImportsController_one"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/invitations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TrialInvitationsController_list"];
        put?: never;
        post: operations["TrialInvitationsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/invitations/{invitationId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["TrialInvitationsController_revoke"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/invitations/{invitationId}/resend": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["TrialInvitationsController_resend"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/layout-impact": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** What a change that clears layouts (the design, adding or removing a treatment, the factors; a site’s blocks, removing or randomizing it again) would lose, asked before making it */
        get: operations["LayoutImpactController_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/level-amounts": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PlotsController_levelAmounts"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/measures": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["MeasuresController_list"];
        put?: never;
        post: operations["MeasuresController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/measures/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["MeasuresController_remove"];
        options?: never;
        head?: never;
        patch: operations["MeasuresController_update"];
        trace?: never;
    };
    "/api/trials/{trialId}/measures/{id}/removal-impact": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** What removing the measure would archive (its values in every round), per site and in words, asked before removing it */
        get: operations["MeasuresController_removalImpact"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/members": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["MembersController_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/members/{userId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        /** Remove a member: their old session gets 403 at once; what they recorded stays under their name; e-mailed to them */
        delete: operations["MembersController_remove"];
        options?: never;
        head?: never;
        /** Change a member's role and (for a collaborator) sites; takes effect on their next request; e-mailed to them */
        patch: operations["MembersController_update"];
        trace?: never;
    };
    "/api/trials/{trialId}/observations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["LedgerController_list"];
        put?: never;
        post: operations["LedgerController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/observations/{observationId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch: operations["LedgerController_edit"];
        trace?: never;
    };
    "/api/trials/{trialId}/observations/{observationId}/history": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["LedgerController_history"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/plots": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PlotsController_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/plots/{plotId}/rounds/{roundId}/photo": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PhotosController_get"];
        put: operations["PhotosController_put"];
        post?: never;
        delete: operations["PhotosController_remove"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/report": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Everything the printable report needs: protocol, sites, per measure the model made for it with its choices and tables, the classical ANOVA and means with letters (the round, scope and mean separation chosen on the Findings page; by default each measure’s latest round with data, all sites combined), cautions and a plain paragraph */
        get: operations["ReportsController_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/rounds": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["RoundsController_list"];
        put?: never;
        post: operations["RoundsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/rounds/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["RoundsController_remove"];
        options?: never;
        head?: never;
        patch: operations["RoundsController_update"];
        trace?: never;
    };
    "/api/trials/{trialId}/rounds/{id}/removal-impact": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** What removing the round would archive (its values of every measure and its photos), per site and in words, asked before removing it */
        get: operations["RoundsController_removalImpact"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/sites": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["SitesController_list"];
        put?: never;
        post: operations["SitesController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/sites/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["SitesController_remove"];
        options?: never;
        head?: never;
        patch: operations["SitesController_update"];
        trace?: never;
    };
    "/api/trials/{trialId}/sites/{siteId}/randomize": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["SitesController_randomize"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/intake": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["IntakeController_upload"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/template.csv": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PlotsController_template"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/template.xlsx": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PlotsController_templateWorkbook"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/treatments": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TreatmentsController_list"];
        put?: never;
        post: operations["TreatmentsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/treatments/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["TreatmentsController_remove"];
        options?: never;
        head?: never;
        patch: operations["TreatmentsController_update"];
        trace?: never;
    };
    "/api/users": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["UsersController_list"];
        put?: never;
        post: operations["UsersController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/users/{userId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        /** An administrator changes an account; isActive false ends its sessions at once */
        patch: operations["UsersController_update"];
        trace?: never;
    };
    "/api/users/{userId}/deactivate": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["UsersController_deactivate"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/users/{userId}/reactivate": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["UsersController_reactivate"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/users/me": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        /** One’s own display name, locale for numbers and dates, and e-mail preferences */
        patch: operations["UsersController_updateMine"];
        trace?: never;
    };
}
export type webhooks = Record<string, never>;
export interface components {
    schemas: {
        AcceptInvitationDto: {
            /**
             * @description Needed when no account exists for the invited e-mail.
             * @example Robin Ash
             */
            name?: string;
            /** @description A new password (at least 12 characters, not a common one) for a new account, or the existing account’s password. Not needed with the bearer token of the invited person. */
            password?: string;
        };
        AccountNoticeDto: {
            message: string;
        };
        ActivationCheckDto: {
            /** @description Each failed check in words, e.g. "Site Millbrook is not randomized yet." */
            problems: string[];
            ready: boolean;
            /** @description What does not stop the trial but should be read before it starts (the design's guardrails per site). */
            warnings: string[];
        };
        ActivityEntryDto: {
            /** Format: date-time */
            at: string;
            details: {
                [key: string]: unknown;
            };
            id: number;
            /**
             * @description e.g. 'trial.created', 'treatment.updated', 'site.randomized', 'invitation.sent'.
             * @example site.randomized
             */
            kind: string;
            siteId: number | null;
            summary: string;
            userId: number | null;
            userName: string | null;
        };
        /** @enum {string} */
        AnalysisDesign: "crd" | "rcbd" | "factorial-crd" | "factorial-rcbd" | "split-plot" | "split-split-plot" | "multisite-rcbd" | "multisite-factorial-rcbd" | "multisite-split-plot";
        AnalysisModelDto: {
            /** @enum {string} */
            kind: "anova" | "reml";
            /** @description Why this model was used, in a sentence. */
            reason: string;
        };
        AnalysisOptionDto: {
            analysis: components["schemas"]["FindingsAnalysis"];
            available: boolean;
            /** @description The analysis made for this measure. */
            isDefault: boolean;
            /** @example Not-drained curves and time ratios */
            label: string;
            /** @description Why it is not available, or the caution it carries. */
            note: string | null;
        };
        AnalysisSnapshotDto: {
            /**
             * @description Friable’s name of the analysis saved.
             * @example Not-drained curves and time ratios
             */
            analysisLabel: string;
            choices: components["schemas"]["SavedAnalysisChoicesDto"];
            commentCount: number;
            /** Format: date-time */
            createdAt: string;
            createdBy: string | null;
            createdById: number | null;
            currentDataHash: string | null;
            /** @description True when the current data's hash differs from dataHash. */
            dataChanged: boolean;
            dataHash: string;
            engineVersion: string;
            id: number;
            measureName: string;
            /** @description The Findings answer as it was saved: the classical ANOVA, or a model’s answer with `analysis`. */
            result: components["schemas"]["FindingsDto"] | components["schemas"]["CensoredFindingsDto"] | components["schemas"]["RepeatedFindingsDto"] | components["schemas"]["AncovaFindingsDto"] | components["schemas"]["OrdinalFindingsDto"] | components["schemas"]["CountsFindingsDto"];
            review: components["schemas"]["ReviewStatusDto"];
            roundLabel: string;
            scopeLabel: string;
            /** Format: date-time */
            signedOffAt: string | null;
            signedOffBy: string | null;
            signedOffById: number | null;
            /** @description Every sign-off, oldest first. */
            signOffs: components["schemas"]["SignOffDto"][];
            title: string;
            trialId: number;
        };
        AnalysisSnapshotSummaryDto: {
            /**
             * @description Friable’s name of the analysis saved.
             * @example Not-drained curves and time ratios
             */
            analysisLabel: string;
            choices: components["schemas"]["SavedAnalysisChoicesDto"];
            commentCount: number;
            /** Format: date-time */
            createdAt: string;
            createdBy: string | null;
            createdById: number | null;
            dataHash: string;
            engineVersion: string;
            id: number;
            measureName: string;
            review: components["schemas"]["ReviewStatusDto"];
            roundLabel: string;
            scopeLabel: string;
            /** Format: date-time */
            signedOffAt: string | null;
            signedOffBy: string | null;
            signedOffById: number | null;
            /** @description Every sign-off, oldest first. */
            signOffs: components["schemas"]["SignOffDto"][];
            title: string;
            trialId: number;
        };
        AnalysisStratumDto: {
            df: number;
            /** @description The ANOVA row that is this stratum's error, e.g. 'block:Amendment' or 'error'. */
            errorTerm: string;
            ms: number;
            /** @description 'plot', 'whole plot', 'sub plot' or 'sub-sub plot'. */
            stratum: string;
            /** @description The terms tested against this error. */
            terms: string[];
        };
        /** @enum {string} */
        AnalysisTransform: "none" | "log" | "sqrt" | "arcsine-sqrt";
        AncovaFindingsDto: {
            /** @enum {string} */
            analysis: "ancova";
            anova: components["schemas"]["AnovaTableRowDto"][];
            /** @description With a covariate: the covariate itself between treatments (a baseline should not differ). */
            baseline?: components["schemas"]["FTestDto"];
            comparisons: components["schemas"]["ComparisonsByMethodDto"];
            context: components["schemas"]["ModelFindingsContextDto"];
            /** @description With a covariate (analysis of covariance): the common slope, with the covariate’s mean. */
            covariate?: components["schemas"]["CovariateSlopeDto"];
            diagnostics: components["schemas"]["DiagnosticsDto"];
            /** @description Factorials and split plots: standard errors of a difference by kind. */
            differences?: components["schemas"]["DifferenceErrorDto"][];
            /** @description Factorials and split plots: each factor's level means compared in its own stratum, by factor name. */
            factorComparisons?: {
                [key: string]: components["schemas"]["StratumComparisonSetDto"];
            };
            /** @description Factorial only: LS means of each factor's levels, by factor name. */
            factorMeans?: {
                [key: string]: components["schemas"]["LsMeanDto"][];
            };
            /** @description Per method, treatment → compact letters. */
            letters: components["schemas"]["LettersByMethodDto"];
            /** @description Factorials and split plots: least-squares means of every main effect and interaction. */
            marginalMeans?: components["schemas"]["TermMeansDto"][];
            means: components["schemas"]["LsMeanDto"][];
            /** @description Factorials and split plots: the model used and why. */
            model?: components["schemas"]["AnalysisModelDto"];
            /** @description Factorials and split plots: each factor within each level of another, for significant two-factor interactions. */
            slices?: components["schemas"]["SliceTestDto"][];
            /** @description With a covariate: the test of equal slopes across treatments. */
            slopes?: components["schemas"]["FTestDto"];
            /** @description Classical factorials and split plots: the error strata, whole plot first. */
            strata?: components["schemas"]["AnalysisStratumDto"][];
            summary: components["schemas"]["AnovaSummaryDto"];
            /** @description REML: the variance of each random term and of the error. */
            varianceComponents?: components["schemas"]["VarianceComponentDto"][];
            /** @description Plain sentences from the engine. */
            warnings: string[];
        };
        AnovaAnswerDto: {
            anova: components["schemas"]["AnovaTableRowDto"][];
            /** @description With a covariate: the covariate itself between treatments (a baseline should not differ). */
            baseline?: components["schemas"]["FTestDto"];
            comparisons: components["schemas"]["ComparisonsByMethodDto"];
            /** @description With a covariate (analysis of covariance): the common slope, with the covariate’s mean. */
            covariate?: components["schemas"]["CovariateSlopeDto"];
            diagnostics: components["schemas"]["DiagnosticsDto"];
            /** @description Factorials and split plots: standard errors of a difference by kind. */
            differences?: components["schemas"]["DifferenceErrorDto"][];
            /** @description Factorials and split plots: each factor's level means compared in its own stratum, by factor name. */
            factorComparisons?: {
                [key: string]: components["schemas"]["StratumComparisonSetDto"];
            };
            /** @description Factorial only: LS means of each factor's levels, by factor name. */
            factorMeans?: {
                [key: string]: components["schemas"]["LsMeanDto"][];
            };
            /** @description Per method, treatment → compact letters. */
            letters: components["schemas"]["LettersByMethodDto"];
            /** @description Factorials and split plots: least-squares means of every main effect and interaction. */
            marginalMeans?: components["schemas"]["TermMeansDto"][];
            means: components["schemas"]["LsMeanDto"][];
            /** @description Factorials and split plots: the model used and why. */
            model?: components["schemas"]["AnalysisModelDto"];
            /** @description Factorials and split plots: each factor within each level of another, for significant two-factor interactions. */
            slices?: components["schemas"]["SliceTestDto"][];
            /** @description With a covariate: the test of equal slopes across treatments. */
            slopes?: components["schemas"]["FTestDto"];
            /** @description Classical factorials and split plots: the error strata, whole plot first. */
            strata?: components["schemas"]["AnalysisStratumDto"][];
            summary: components["schemas"]["AnovaSummaryDto"];
            /** @description REML: the variance of each random term and of the error. */
            varianceComponents?: components["schemas"]["VarianceComponentDto"][];
            /** @description Plain sentences from the engine. */
            warnings: string[];
        };
        AnovaRequestDto: {
            /** @default 0.05 */
            alpha?: number;
            /**
             * @description The control treatment, needed for Dunnett.
             * @example CTRL
             */
            control?: string;
            /**
             * @description REML fits: the denominator degrees of freedom of the F tests and comparisons (as pbkrtest or lmerTest give them).
             * @default kenward-roger
             * @enum {string}
             */
            ddf?: "kenward-roger" | "satterthwaite";
            /** @enum {string} */
            design: "crd" | "rcbd" | "factorial-crd" | "factorial-rcbd" | "split-plot" | "split-split-plot" | "multisite-rcbd" | "multisite-factorial-rcbd" | "multisite-split-plot";
            /**
             * @description Factorials and split plots: the factor names (a split plot’s from the whole-plot factor down); default: the keys of the first observation’s factors.
             * @example [
             *       "Amendment",
             *       "Mulch"
             *     ]
             */
            factorNames?: string[];
            /**
             * @description Show Fisher’s LSD even when the treatment F test is not significant.
             * @default false
             */
            forceLsd?: boolean;
            /**
             * @default [
             *       "tukey"
             *     ]
             */
            meanSeparation?: ("lsd" | "tukey" | "dunnett" | "bonferroni" | "holm")[];
            /**
             * @description Factorials and split plots: the classical ANOVA or REML (Kenward–Roger). Default: anova when every plot is present, else reml; the answer says which and why.
             * @enum {string}
             */
            model?: "anova" | "reml";
            observations: components["schemas"]["ObservationDto"][];
            /**
             * @default random
             * @enum {string}
             */
            sitesAre?: "random" | "fixed";
            /**
             * @default none
             * @enum {string}
             */
            transform?: "none" | "log" | "sqrt" | "arcsine-sqrt";
        };
        AnovaSummaryDto: {
            /** @description Coefficient of variation, % (100 × root MSE / grand mean). */
            cv: number;
            errorDf: number;
            grandMean: number;
            n: number;
            rootMse: number;
        };
        AnovaTableRowDto: {
            /** @description REML rows: Kenward–Roger denominator degrees of freedom. */
            denDf?: number;
            df: number;
            /** @description The row the term was tested against ('error', 'block:A', 'site:treatment', 'kenward-roger'); null when not tested. */
            errorTerm?: string | null;
            f: number | null;
            /** @description Null where the term is not tested. */
            ms: number | null;
            /** @description REML rows: numerator degrees of freedom. */
            numDf?: number;
            p: number | null;
            /** @description Null for a REML row. */
            ss: number | null;
            /** @description 'block', 'treatment', 'site', 'block:site', 'site:treatment', factor names and 'A:B', 'error', 'total'. */
            term: string;
        };
        /**
         * @description Where the levels go on: every plot, or a split plot's whole plots, sub plots or sub-sub plots.
         * @enum {string}
         */
        AppliedUnit: "plot" | "whole plot" | "sub plot" | "sub-sub plot";
        AssessmentRoundConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["AssessmentRoundDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        AssessmentRoundDto: {
            dayOffset: number;
            /**
             * Format: date
             * @description startDate + dayOffset; null while the trial has no start date.
             */
            dueDate: string | null;
            id: number;
            label: string;
            measureIds: number[];
            /** @description Bumped by every save; send it back with each edit: another one answers 409 with the current record. */
            version: number;
        };
        BartlettDto: {
            p: number;
            statistic: number;
        };
        BrownForsytheDto: {
            f: number;
            p: number;
        };
        CategoryShareDto: {
            /** @example 4 */
            category: string;
            /**
             * @description Predicted share of plots with this score, averaged over blocks.
             * @example 0.41
             */
            probability: number;
            /**
             * @description Delta-method standard error.
             * @example 0.08
             */
            se: number;
            /** @example CMP */
            treatment: string;
        };
        CensoredAnswerDto: {
            /** @description How the comparisons with the control are adjusted, in words. */
            adjustment: string;
            /** @description With several sites: each site’s curves and medians. */
            bySite?: components["schemas"]["SiteCurvesDto"][];
            /** @description Log-time coefficients (treatment contrasts against the control). */
            coefficients: components["schemas"]["ModelCoefficientDto"][];
            /** @example CTRL */
            control: string;
            curves: components["schemas"]["CurveDto"][];
            /** @enum {string} */
            distribution: "weibull" | "lognormal" | "loglogistic";
            /** @description Null when the time-ratio model could not be fitted (warnings say why). */
            logLik: number | null;
            logRank: components["schemas"]["LogRankDto"];
            medians: components["schemas"]["MedianTimeDto"][];
            scale: number | null;
            tests: components["schemas"]["LikelihoodRatioTestDto"][];
            /** @description Typical drain time relative to the control’s (below 1: faster). */
            timeRatios: components["schemas"]["ControlRatioDto"][];
            treatments: components["schemas"]["TreatmentCountDto"][];
            warnings: string[];
        };
        CensoredFindingsDto: {
            /** @description How the comparisons with the control are adjusted, in words. */
            adjustment: string;
            /** @enum {string} */
            analysis: "censored";
            /** @description With several sites: each site’s curves and medians. */
            bySite?: components["schemas"]["SiteCurvesDto"][];
            /** @description Log-time coefficients (treatment contrasts against the control). */
            coefficients: components["schemas"]["ModelCoefficientDto"][];
            context: components["schemas"]["ModelFindingsContextDto"];
            /** @example CTRL */
            control: string;
            curves: components["schemas"]["CurveDto"][];
            /** @enum {string} */
            distribution: "weibull" | "lognormal" | "loglogistic";
            /** @description Null when the time-ratio model could not be fitted (warnings say why). */
            logLik: number | null;
            logRank: components["schemas"]["LogRankDto"];
            medians: components["schemas"]["MedianTimeDto"][];
            scale: number | null;
            tests: components["schemas"]["LikelihoodRatioTestDto"][];
            /** @description Typical drain time relative to the control’s (below 1: faster). */
            timeRatios: components["schemas"]["ControlRatioDto"][];
            treatments: components["schemas"]["TreatmentCountDto"][];
            warnings: string[];
        };
        CensoredObservationDto: {
            /**
             * @description Block label, nested within its site (rcbd, multisite-rcbd).
             * @example 1
             */
            block?: string;
            /**
             * @description True when the plot had not drained by `value` (right-censored).
             * @example false
             */
            censored: boolean;
            /** @example Hollow Lane */
            site?: string;
            /** @example GYP */
            treatment: string;
            /**
             * @description The drain time, or the cut-off the plot had not drained by; null for a plot not timed, left out (the answer says how many were).
             * @example 212.5
             */
            value: (number | string) | null;
        };
        CensoredRequestDto: {
            /**
             * @description The reference of the time ratios; default the first treatment.
             * @example CTRL
             */
            control?: string;
            /**
             * @description crd (treatment), rcbd (block, treatment), multisite-rcbd (site, block within site, treatment).
             * @enum {string}
             */
            design: "crd" | "rcbd" | "multisite-rcbd";
            /**
             * @description Distribution of the time-ratio (accelerated-failure-time) model.
             * @enum {string}
             */
            distribution: "weibull" | "lognormal" | "loglogistic";
            observations: components["schemas"]["CensoredObservationDto"][];
        };
        CensoredSummaryDto: {
            count: number;
            cutoff: number | null;
        };
        CommentDeleteDto: {
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
        };
        CommentInputDto: {
            /** @example The gypsum plots at Quarry Hill drained oddly fast; worth a look at the plot notes. */
            body: string;
            /** @description The comment this one answers. */
            parentId?: number | null;
        };
        CommentRevisionDto: {
            /** Format: date-time */
            at: string;
            /** @description The text as it was before this change. */
            body: string;
            byName: string | null;
            /** @enum {string} */
            kind: "edited" | "deleted";
        };
        CommentUpdateDto: {
            /** @description New text (the author only); the old text is kept as "edited". */
            body?: string;
            /** @description Mark the thread resolved, or open it again. */
            resolved?: boolean;
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
        };
        ComparisonsByMethodDto: {
            bonferroni?: components["schemas"]["MethodComparisonSetDto"];
            dunnett?: components["schemas"]["MethodComparisonSetDto"];
            holm?: components["schemas"]["MethodComparisonSetDto"];
            lsd?: components["schemas"]["MethodComparisonSetDto"];
            tukey?: components["schemas"]["MethodComparisonSetDto"];
        };
        ControlRatioDto: {
            /** @example 1.2 */
            lower: number;
            /**
             * @description Single-step adjusted p-value.
             * @example 0.002
             */
            p: number;
            /** @example 1.8 */
            ratio: number;
            /** @example CMP */
            treatment: string;
            /** @example 2.7 */
            upper: number;
        };
        CountRateDto: {
            /** @example 9.8 */
            lower: number;
            /**
             * @description The model’s count per plot, averaged over blocks on the log scale.
             * @example 12.4
             */
            rate: number;
            /** @example CMP */
            treatment: string;
            /** @example 15.7 */
            upper: number;
        };
        CountsAnswerDto: {
            adjustment: string;
            /** @description Log-rate coefficients (treatment contrasts against the control). */
            coefficients: components["schemas"]["ModelCoefficientDto"][];
            /** @example CTRL */
            control: string;
            deviance: number;
            /**
             * @description Pearson χ² / residual df of the Poisson fit.
             * @example 1.5
             */
            dispersion: number;
            /** @enum {string} */
            family: "poisson" | "quasipoisson";
            logLik: number;
            overdispersion: components["schemas"]["OverdispersionDto"];
            /** @description Count rate relative to the control’s. */
            rateRatios: components["schemas"]["ControlRatioDto"][];
            rates: components["schemas"]["CountRateDto"][];
            residualDf: number;
            tests: components["schemas"]["CountTermTestDto"][];
            warnings: string[];
        };
        CountsFindingsDto: {
            adjustment: string;
            /** @enum {string} */
            analysis: "counts";
            /** @description Log-rate coefficients (treatment contrasts against the control). */
            coefficients: components["schemas"]["ModelCoefficientDto"][];
            context: components["schemas"]["ModelFindingsContextDto"];
            /** @example CTRL */
            control: string;
            deviance: number;
            /**
             * @description Pearson χ² / residual df of the Poisson fit.
             * @example 1.5
             */
            dispersion: number;
            /** @enum {string} */
            family: "poisson" | "quasipoisson";
            logLik: number;
            overdispersion: components["schemas"]["OverdispersionDto"];
            /** @description Count rate relative to the control’s. */
            rateRatios: components["schemas"]["ControlRatioDto"][];
            rates: components["schemas"]["CountRateDto"][];
            residualDf: number;
            tests: components["schemas"]["CountTermTestDto"][];
            warnings: string[];
        };
        CountsRequestDto: {
            /**
             * @description The reference of the odds ratios; default the first treatment.
             * @example CTRL
             */
            control?: string;
            /** @enum {string} */
            design: "crd" | "rcbd" | "multisite-rcbd";
            /**
             * @description auto: quasi-Poisson when Pearson’s χ² shows overdispersion at the 5 % level.
             * @default auto
             * @enum {string}
             */
            family?: "auto" | "poisson" | "quasipoisson";
            /** @description value: the score. */
            observations: components["schemas"]["LabelledValueDto"][];
        };
        CountTermTestDto: {
            /** @description Poisson: the deviance as χ². */
            chiSquare: number | null;
            denDf: number | null;
            /**
             * @description Deviance explained by the term.
             * @example 31.2
             */
            deviance: number;
            /** @example 4 */
            df: number;
            /** @description Quasi-Poisson: F against the dispersion. */
            f: number | null;
            p: number | null;
            /** @example treatment */
            term: string;
        };
        CovarianceChoiceDto: {
            /** @description −2 logLik + 2 (fixed effects + covariance parameters). */
            aic: number;
            /** @description REML log-likelihood (nlme’s and lme4’s convention, R’s default treatment contrasts). */
            logLik: number;
            /**
             * @description cs: plotVariance, residualVariance, correlation; ar1: variance, phi (correlation a day apart); unstructured: variance[round], covariance[round,round].
             * @example {
             *       "variance": 4.1,
             *       "phi": 0.97
             *     }
             */
            parameters: {
                [key: string]: number;
            };
            /** @enum {string} */
            structure: "cs" | "ar1" | "unstructured";
            /** @description Why this structure could not be fitted (then the other fields are absent). */
            unavailable?: string;
        };
        CovariateSlopeDto: {
            mean: number;
            p: number;
            se: number;
            slope: number;
            t: number;
        };
        CreateAnalysisDto: {
            /** @default 0.05 */
            alpha?: number;
            /**
             * @description Leave out for the model made for the measure: censored (time with a cut-off), ordinal (score), counts (count); a number: ancova with a day-0 baseline and one later round, repeated with two or more rounds, else anova.
             * @enum {string}
             */
            analysis?: "anova" | "censored" | "repeated" | "ancova" | "ordinal" | "counts";
            /**
             * @description repeated: the within-plot covariance (auto: lowest AIC).
             * @default auto
             * @enum {string}
             */
            covariance?: "cs" | "ar1" | "unstructured" | "auto";
            /** @description ancova: the measure whose values are the covariate; default the analysed measure. */
            covariateMeasureId?: number;
            /** @description ancova: the round whose values are the covariate; default the day-0 round (else the earliest earlier round with values). */
            covariateRoundId?: number;
            /**
             * @description censored: the time-ratio model’s distribution.
             * @default weibull
             * @enum {string}
             */
            distribution?: "weibull" | "lognormal" | "loglogistic";
            /**
             * @description counts: auto takes quasi-Poisson when the counts are overdispersed.
             * @default auto
             * @enum {string}
             */
            family?: "auto" | "poisson" | "quasipoisson";
            /**
             * @description Compute Fisher’s LSD even when the treatment F test is not significant.
             * @default false
             */
            forceLsd?: boolean;
            /** @description The measure to analyse. */
            measureId: number;
            /**
             * @description Mean separation method.
             * @default tukey
             * @enum {string}
             */
            method?: "lsd" | "tukey" | "dunnett" | "bonferroni" | "holm";
            /** @description The assessment round to analyse; leave out for the latest round holding values of the measure in this scope. */
            roundId?: number;
            /** @description One site; leave out for all sites combined (a trial with one site: that site). */
            siteId?: number;
            /**
             * @description With all sites combined: random tests treatment against site × treatment.
             * @default random
             * @enum {string}
             */
            sitesAre?: "random" | "fixed";
            /** @example Drain time, Day 14, all sites */
            title: string;
            /**
             * @default none
             * @enum {string}
             */
            transform?: "none" | "log" | "sqrt" | "arcsine-sqrt";
        };
        CreateInvitationDto: {
            /** @example robin.ash@example.org */
            email: string;
            /** @description A personal note included in the e-mail. */
            message?: string | null;
            /** @enum {string} */
            role: "investigator" | "collaborator" | "reviewer";
            /** @description Required for collaborators: a site of this trial. */
            siteId?: number | null;
        };
        CreateMeasureDto: {
            /**
             * @description Unique in the trial: 1 to 12 letters, digits or dashes.
             * @example DRAIN
             */
            code: string;
            /** @description Cut-off in the unit (kind time-with-cutoff). */
            cutoff?: number | null;
            /** @default 1 */
            decimals?: number;
            /** @description Above: an error. */
            hardMax?: number | null;
            /** @description Below: an error. */
            hardMin?: number | null;
            /** @description Asked, never assumed: whether a higher value is the better outcome (false for drain times). */
            higherIsBetter: boolean;
            /** @enum {string} */
            kind: "continuous" | "count" | "score" | "time-with-cutoff";
            /**
             * @description Unique in the trial (ignoring case): 1 to 80 characters starting with a letter or digit; brackets and units are fine.
             * @example drain time (first pour)
             */
            name: string;
            /** @description Above: a warning. */
            plausibleMax?: number | null;
            /** @description Below: a warning. */
            plausibleMin?: number | null;
            position?: number;
            /** @description Highest score (kind score). */
            scaleMax?: number | null;
            /** @description Lowest score (kind score). */
            scaleMin?: number | null;
            /**
             * @description A unit Friable converts (@friable/field's MEASURE_UNITS).
             * @example s
             * @enum {string}
             */
            unit: "s" | "min" | "h" | "mm" | "cm" | "m" | "in" | "ft" | "mL" | "L" | "gal" | "ft3" | "yd3" | "g" | "kg" | "oz" | "lb" | "m2" | "ft2" | "kPa" | "MPa" | "psi" | "kgf/cm2" | "tsf" | "mm/h" | "in/h" | "g/cm3" | "lb/ft3" | "dS/m" | "mS/cm" | "mmho/cm" | "µS/cm" | "score" | "count" | "%" | "ratio";
        };
        CreateObservationDto: {
            /** @description Keep a value outside the usual range as typed. */
            acceptWarnings?: boolean;
            measureId: number;
            /**
             * @description Why the value is missing (only for a missing value).
             * @example bed flooded
             */
            missingReason?: string | null;
            /** @description Notes, kept exactly as typed. */
            notes?: string | null;
            plotId: number;
            roundId: number;
            /**
             * @description As typed: "12.5", ">600" (not drained by the cut-off), "" or "NA" (missing).
             * @example 12.5
             */
            value: string;
        };
        CreateRoundDto: {
            /**
             * @description Days after the trial start date (due date = start date + offset).
             * @example 14
             */
            dayOffset: number;
            /** @example Day 14 */
            label: string;
            /** @description The measures taken in this round (at least one). */
            measureIds: number[];
        };
        CreateSiteDto: {
            /**
             * @description Blocks (replicates for crd).
             * @example 5
             */
            blocks: number;
            containerDepthCm?: number | null;
            /** @description Round plots or containers: inside diameter at the soil surface. */
            diameterCm?: number | null;
            /**
             * @description Two or three capital letters; made from the name when left out.
             * @example HL
             */
            labelPrefix?: string;
            /** @description A member of the trial who leads the work at this site. */
            leadUserId?: number | null;
            /** @description Rectangle plots. */
            lengthM?: number | null;
            location?: string | null;
            /** @example Hollow Lane Community Garden */
            name: string;
            /** @enum {string} */
            shape: "rectangle" | "round";
            soilDescription?: string | null;
            /** @description Soil volume per container, for rates per soil volume. */
            soilVolumeL?: number | null;
            /** @description Rectangle plots. */
            widthM?: number | null;
        };
        CreateTreatmentDto: {
            /**
             * @description Unique in the trial: 1 to 12 letters, digits or dashes.
             * @example G40
             */
            code: string;
            description?: string | null;
            /** @description Depth the field rate is mixed into (concentration basis). */
            incorporationDepthCm?: number | null;
            /** @default false */
            isControl?: boolean;
            /**
             * @default other
             * @enum {string}
             */
            materialKind?: "gypsum" | "other";
            /**
             * @default as-is
             * @enum {string}
             */
            moistureBasis?: "as-is" | "dry";
            /** @description Water share of the as-is product, at least 0 and below 1. */
            moistureFraction?: number | null;
            /** @example Gypsum 40 lb/1000 ft² */
            name: string;
            /** @description Order in lists, from 1. */
            position?: number;
            /** @example Garden gypsum, 20 kg bag */
            product?: string | null;
            /** @description Share of active material, above 0 and at most 1. */
            purity?: number | null;
            /**
             * @default area
             * @enum {string}
             */
            rateBasis?: "area" | "concentration";
            /** @enum {string|null} */
            rateUnit?: "lb/100ft2" | "lb/1000ft2" | "lb/acre" | "g/m2" | "kg/m2" | "kg/ha" | "t/ha" | "ton/acre" | "in" | "cm" | "yd3/1000ft2" | null;
            /** @example 40 */
            rateValue?: number | null;
        };
        CreateTrialDto: {
            /**
             * @description Short unique code: letters, digits and dashes.
             * @example CLAY-27
             */
            code: string;
            /**
             * @default rcbd
             * @enum {string}
             */
            design?: "crd" | "rcbd" | "factorial-crd" | "factorial-rcbd" | "split-plot" | "split-split-plot";
            /** @description The question or hypothesis the trial answers. */
            question?: string | null;
            safetyNotes?: string | null;
            /**
             * @description Randomization seed text; a random one when left out.
             * @example clay-2026
             */
            seed?: string;
            /** @example 2026-04-01 */
            startDate?: string | null;
            /** @example Gypsum and compost on heavy clay */
            title: string;
        };
        CreateUserDto: {
            /** @example new.person@example.org */
            email: string;
            /** @default false */
            isAdmin?: boolean;
            /** @example Robin Ash */
            name: string;
            /**
             * @description At least 12 characters; not a common password.
             * @example a long passphrase
             */
            password: string;
        };
        CurveDto: {
            points: components["schemas"]["CurvePointDto"][];
            /** @example GYP */
            treatment: string;
        };
        CurvePointDto: {
            /** @example 12 */
            atRisk: number;
            /** @example 0 */
            censored: number;
            /** @example 1 */
            events: number;
            /** @example 0.52 */
            lower: number | null;
            /**
             * @description Share of plots not yet drained just after `time`.
             * @example 0.75
             */
            notDrained: number;
            /** @example 212 */
            time: number;
            /** @example 1 */
            upper: number | null;
        };
        DiagnosticsDto: {
            /** @description Multisite only: Bartlett's test of the per-site error variances. */
            bartlett?: components["schemas"]["BartlettDto"];
            /** @description Null when a treatment has a single plot. */
            brownForsythe: components["schemas"]["BrownForsytheDto"] | null;
            residuals: components["schemas"]["ResidualPointDto"][];
            /** @description Null outside 3..5000 residuals. */
            shapiroWilk: components["schemas"]["ShapiroWilkDto"] | null;
        };
        DifferenceErrorDto: {
            /** @description t at α (two-sided); the weighted t where strata mix. */
            critical: number;
            /** @example Two Amendment (whole-plot) means at the same or different levels of Mulch */
            description: string;
            /** @description Degrees of freedom (Satterthwaite's where strata mix; Kenward–Roger for REML). */
            df: number;
            errorTerm: string;
            /** @example Amendment within Mulch */
            kind: string;
            /** @description critical × se. */
            lsd: number;
            /** @description Standard error of the difference. */
            se: number;
        };
        DoseAnswerDto: {
            areaM2: number;
            basis: components["schemas"]["RateBasis"];
            gallons: number | null;
            grams: number | null;
            kilograms: number | null;
            /** @description Depth rates: the volume. */
            litres: number | null;
            ounces: number | null;
            pounds: number | null;
            ratePerM2: components["schemas"]["RatePerSquareMetreDto"];
            /** @description When `plots` was given: the amount for all of them with the margin. */
            total?: components["schemas"]["DoseTotalDto"];
            warnings: string[];
        };
        DoseRequestDto: {
            /** @description Give exactly one of areaM2, diameterCm, or lengthM with widthM. */
            areaM2?: number;
            /**
             * @example area
             * @enum {string}
             */
            basis: "area" | "concentration";
            bulkDensityKgPerL?: number;
            /** @description Incorporation depth of the field rate (concentration basis). */
            depthCm?: number;
            /** @example 30 */
            diameterCm?: number;
            lengthM?: number;
            /** @default 0 */
            marginPercent?: number;
            /** @enum {string} */
            materialKind?: "gypsum" | "other";
            moistureFraction?: number;
            /** @description With plots, the answer adds the total for all of them. */
            plots?: number;
            purity?: number;
            /** @example 40 */
            rate: number;
            /** @description Soil volume of the container (concentration basis). */
            soilVolumeL?: number;
            /**
             * @example lb/1000ft2
             * @enum {string}
             */
            unit: "lb/100ft2" | "lb/1000ft2" | "lb/acre" | "g/m2" | "kg/m2" | "kg/ha" | "t/ha" | "ton/acre" | "in" | "cm" | "yd3/1000ft2";
            widthM?: number;
        };
        DoseTotalDto: {
            gallons: number | null;
            grams: number | null;
            kilograms: number | null;
            litres: number | null;
            pounds: number | null;
        };
        EditObservationDto: {
            /** @description Keep a value outside the usual range as typed. */
            acceptWarnings?: boolean;
            /**
             * @description Why the value is missing (only for a missing value).
             * @example bed flooded
             */
            missingReason?: string | null;
            /** @description Notes, kept exactly as typed. */
            notes?: string | null;
            /**
             * @description As typed: "12.5", ">600" (not drained by the cut-off), "" or "NA" (missing).
             * @example 12.5
             */
            value: string;
            /**
             * @description The version the editor saw; a stale one answers 409 with the current value.
             * @example 1
             */
            version: number;
        };
        EngineRequestDto: {
            alpha: number;
            control?: string;
            design: components["schemas"]["AnalysisDesign"];
            forceLsd: boolean;
            meanSeparation: components["schemas"]["SeparationMethod"][];
            /** @enum {string} */
            sitesAre?: "random" | "fixed";
            transform: components["schemas"]["AnalysisTransform"];
        };
        ErrorStratumDto: {
            /**
             * @description How the df are counted, in words.
             * @example (2 blocks − 1) × (2 levels of Amendment − 1)
             */
            arithmetic: string;
            /** @description The F the first term must exceed at p = 0.05; null with no error df. */
            criticalF: number | null;
            errorDf: number;
            /** @example Whole-plot error */
            name: string;
            /** @description Terms tested against it: factor names joined by ':', or 'treatment'. */
            terms: string[];
            unit: components["schemas"]["AppliedUnit"];
        };
        FactorDto: {
            levels: components["schemas"]["FactorLevelDto"][];
            /** @example Gypsum */
            name: string;
            /**
             * @description The version of the factor stored at this place, as GET answered it; needed for every factor that exists. Another one answers 409 with the current factors.
             * @example 1
             */
            version?: number;
        };
        FactorialMeanDto: {
            /** @description With a transform: the mean back on the original scale. */
            backTransformedMean?: number;
            /** @description Level of each factor of the term, by factor name. */
            levels: {
                [key: string]: string;
            };
            mean: number;
            n: number;
            se: number;
            treatment: string;
        };
        FactorLevelDto: {
            /**
             * @description 1 to 6 letters or digits, unique within the factor.
             * @example G1
             */
            code: string;
            description?: string | null;
            /** @description Depth the field rate is mixed into (concentration basis). */
            incorporationDepthCm?: number | null;
            /**
             * @default other
             * @enum {string}
             */
            materialKind?: "gypsum" | "other";
            /**
             * @default as-is
             * @enum {string}
             */
            moistureBasis?: "as-is" | "dry";
            /** @description Water share of the as-is product, at least 0 and below 1. */
            moistureFraction?: number | null;
            /** @example Gypsum 40 lb/1000 ft² */
            name: string;
            /** @example Garden gypsum, 20 kg bag */
            product?: string | null;
            /** @description Share of active material, above 0 and at most 1. */
            purity?: number | null;
            /**
             * @default area
             * @enum {string}
             */
            rateBasis?: "area" | "concentration";
            /** @enum {string|null} */
            rateUnit?: "lb/100ft2" | "lb/1000ft2" | "lb/acre" | "g/m2" | "kg/m2" | "kg/ha" | "t/ha" | "ton/acre" | "in" | "cm" | "yd3/1000ft2" | null;
            /** @example 40 */
            rateValue?: number | null;
        };
        FactorsDto: {
            /** @description A factorial takes 2 to 4 factors; a split plot exactly 2 (the whole-plot factor first), a split-split plot 3 (whole plot, sub plot, sub-sub plot). The treatments become every combination of their levels. Same factors and level codes as before: names and rates change in place and the plot layouts stay. */
            factors: components["schemas"]["FactorDto"][];
        };
        FactorsReplacedDto: {
            factors: components["schemas"]["TrialFactorDto"][];
            treatments: components["schemas"]["TreatmentDto"][];
        };
        /**
         * @description The analysis of this answer.
         * @enum {string}
         */
        FindingsAnalysis: "anova" | "censored" | "repeated" | "ancova" | "ordinal" | "counts";
        FindingsChoicesDto: {
            alpha: number;
            forceLsd: boolean;
            measureId: number;
            method: components["schemas"]["SeparationMethod"];
            roundId: number;
            /** @description null = all sites combined. */
            siteId: number | null;
            /** @enum {string} */
            sitesAre: "random" | "fixed";
            transform: components["schemas"]["AnalysisTransform"];
        };
        FindingsContextDto: {
            censored: components["schemas"]["CensoredSummaryDto"];
            choices: components["schemas"]["FindingsChoicesDto"];
            controlCode: string | null;
            /** @description SHA-256 (hex) of the canonical JSON of the observations sent to the engine. */
            dataHash: string;
            engineRequest: components["schemas"]["EngineRequestDto"];
            engineVersion: string;
            meansOverTime: components["schemas"]["MeansOverTimePointDto"][];
            measure: components["schemas"]["FindingsMeasureDto"];
            missing: components["schemas"]["MissingSummaryDto"];
            /** @description Which model this is (the ANOVA), the one made for the measure and the others on offer. */
            modelChoice?: components["schemas"]["ModelChoiceDto"];
            /** @description Time-with-cutoff measures only. */
            notDrained?: components["schemas"]["NotDrainedCurveDto"][];
            notices: string[];
            /** @description In the order given to the engine (residual index = position). */
            observations: components["schemas"]["FindingsObservationRowDto"][];
            percentOfControl: components["schemas"]["PercentOfControlDto"][];
            rankTest: components["schemas"]["FindingsRankTestDto"];
            /** @description The round analysed (rounds over time: the latest used). */
            round: components["schemas"]["RoundRefDto"];
            scope: components["schemas"]["FindingsScopeDto"];
            trialCode: string;
            trialId: number;
        };
        FindingsDto: {
            anova: components["schemas"]["AnovaTableRowDto"][];
            /** @description With a covariate: the covariate itself between treatments (a baseline should not differ). */
            baseline?: components["schemas"]["FTestDto"];
            comparisons: components["schemas"]["ComparisonsByMethodDto"];
            context: components["schemas"]["FindingsContextDto"];
            /** @description With a covariate (analysis of covariance): the common slope, with the covariate’s mean. */
            covariate?: components["schemas"]["CovariateSlopeDto"];
            diagnostics: components["schemas"]["DiagnosticsDto"];
            /** @description Factorials and split plots: standard errors of a difference by kind. */
            differences?: components["schemas"]["DifferenceErrorDto"][];
            /** @description Factorials and split plots: each factor's level means compared in its own stratum, by factor name. */
            factorComparisons?: {
                [key: string]: components["schemas"]["StratumComparisonSetDto"];
            };
            /** @description Factorial only: LS means of each factor's levels, by factor name. */
            factorMeans?: {
                [key: string]: components["schemas"]["LsMeanDto"][];
            };
            /** @description Per method, treatment → compact letters. */
            letters: components["schemas"]["LettersByMethodDto"];
            /** @description Factorials and split plots: least-squares means of every main effect and interaction. */
            marginalMeans?: components["schemas"]["TermMeansDto"][];
            means: components["schemas"]["LsMeanDto"][];
            /** @description Factorials and split plots: the model used and why. */
            model?: components["schemas"]["AnalysisModelDto"];
            /** @description Factorials and split plots: each factor within each level of another, for significant two-factor interactions. */
            slices?: components["schemas"]["SliceTestDto"][];
            /** @description With a covariate: the test of equal slopes across treatments. */
            slopes?: components["schemas"]["FTestDto"];
            /** @description Classical factorials and split plots: the error strata, whole plot first. */
            strata?: components["schemas"]["AnalysisStratumDto"][];
            summary: components["schemas"]["AnovaSummaryDto"];
            /** @description REML: the variance of each random term and of the error. */
            varianceComponents?: components["schemas"]["VarianceComponentDto"][];
            /** @description Plain sentences from the engine. */
            warnings: string[];
        };
        FindingsMeasureDto: {
            code: string;
            cutoff: number | null;
            decimals: number;
            higherIsBetter: boolean;
            id: number;
            kind: components["schemas"]["MeasureKind"];
            name: string;
            unit: string;
        };
        FindingsObservationRowDto: {
            block: number;
            censored: boolean;
            /** @description Factorial and split designs: the level code of each factor, by factor name. */
            factors?: {
                [key: string]: string;
            };
            observationId: number;
            plotLabel: string;
            siteName: string;
            /** @description Treatment code (the label the engine sees). */
            treatment: string;
            /** @description The stored decimal text (censored values: the cut-off value). */
            value: string;
        };
        FindingsRankTestDto: {
            blocksUsed?: number;
            df: number | null;
            droppedBlocks?: string[];
            p: number | null;
            /** @description Null when the rank test could not run (unavailable says why). */
            statistic: number | null;
            /** @enum {string} */
            test: "friedman" | "kruskal-wallis";
            unavailable?: string;
        };
        FindingsScopeDto: {
            /** @description 'one site' or 'all sites combined'. */
            label: string;
            siteId: number | null;
            siteName: string | null;
            siteNames: string[];
        };
        FindingsSummaryDto: {
            measure: components["schemas"]["FindingsMeasureDto"];
            round: components["schemas"]["RoundRefDto"];
            scope: components["schemas"]["FindingsScopeDto"];
            /** @description In the protocol’s treatment order. */
            treatments: components["schemas"]["FindingsSummaryRowDto"][];
        };
        FindingsSummaryRowDto: {
            /** @description Values not reached by the cut-off. */
            censored: number;
            max: number | null;
            mean: number | null;
            median: number | null;
            min: number | null;
            /** @description Plots without a value (marked missing, or never recorded). */
            missing: number;
            /** @description Plots of the treatment in the scope. */
            plots: number;
            /** @description Sample standard deviation; null with fewer than two values. */
            sd: number | null;
            treatment: string;
            /** @description Values recorded, censored ones included at their cut-off. */
            values: number;
        };
        FTestDto: {
            df1: number;
            df2: number;
            f: number;
            p: number;
        };
        HealthReportDto: {
            /** @enum {string} */
            database: "up" | "down";
            /** @description What is down, in words. */
            message?: string;
            /** @enum {string} */
            status: "ok" | "unavailable";
        };
        IntakeChangeDto: {
            /** @example NA (bed flooded) */
            after: string | null;
            /** @example 12.50 */
            before: string | null;
            /** @enum {string} */
            kind: "new" | "changed" | "unchanged";
            /** @example DRAIN */
            measureCode: string;
            /** @example HL-B1-P01 */
            plotLabel: string;
        };
        IntakeColumnChoiceDto: {
            /**
             * @description plotLabel, block, treatment, notes, missingReason, a measure code, notes:<measure code> (that measure’s own notes), or null (not read).
             * @example DRAIN
             */
            choice: string | null;
            /** @example secs to drain */
            header: string;
        };
        IntakeImportDto: {
            /** @description Bytes of a CSV file read so far. */
            bytesRead: number;
            dryRun: boolean;
            /** @example hollow-lane-day-0.xlsx */
            fileName: string;
            /** Format: date-time */
            finishedAt: string | null;
            /** @enum {string} */
            format: "csv" | "xlsx";
            message: string | null;
            /** @description The 422 answer, once refused. */
            refusal: components["schemas"]["IntakeRefusalDto"] | null;
            /** @description The 200 answer, once done. */
            result: components["schemas"]["IntakeResultDto"] | null;
            roundId: number;
            /** @description Data rows read and checked so far. */
            rowsChecked: number;
            siteId: number;
            sizeBytes: number;
            /** @enum {string} */
            stage: "checking" | "comparing" | "writing" | "done" | "refused" | "failed" | "interrupted";
            /** Format: date-time */
            startedAt: string;
            ticket: string;
            /** Format: date-time */
            updatedAt: string;
            userName: string | null;
            valuesDone: number;
            /** @description Values to compare or write, once known. */
            valuesTotal: number | null;
        };
        IntakeProblemDto: {
            /**
             * @description The column header as written in the file.
             * @example drain time (s)
             */
            column: string | null;
            /** @example Row 4, drain time (s): "abc" is not a number. */
            message: string;
            /**
             * @description The row a spreadsheet shows (the header is row 1); null for the whole file.
             * @example 4
             */
            row: number | null;
        };
        IntakeRefusalDto: {
            /** @example Unprocessable Entity */
            error: string;
            errors: components["schemas"]["IntakeProblemDto"][];
            /** @example Nothing was written: the file has 3 problems in 2 rows. Correct them and upload the whole file again. */
            message: string;
            /** @enum {number} */
            statusCode: 422;
        };
        IntakeResultDto: {
            /** @description Changed values first, then new, then unchanged, each in file order; at most 1,000. */
            changes: components["schemas"]["IntakeChangeDto"][];
            /**
             * @description Values counted above but not listed in changes.
             * @example 0
             */
            changesOmitted: number;
            /** @example 27 */
            created: number;
            dryRun: boolean;
            identicalToPrevious: boolean;
            /** @example Saved good.csv for Test Garden, Day 0: 27 new values, 0 changed, 0 unchanged. */
            message: string;
            /**
             * @description The import record of this upload.
             * @example 3f0c9a52-8d0e-4f7b-9a55-0a4d7c2e1b6f
             */
            ticket: string;
            /** @example 0 */
            unchanged: number;
            /** @example 0 */
            updated: number;
            /** @description Values outside the usual range (to accept with acceptWarnings=true) and notes about columns. */
            warnings: components["schemas"]["IntakeProblemDto"][];
        };
        InvitationAcceptResponseDto: {
            /** @description Short-lived access token (JWT, HS256) for the Authorization: Bearer header. */
            accessToken: string;
            /** @description Seconds until the access token expires; sign in again after that. */
            expiresIn: number;
            /** @enum {string} */
            tokenType: "Bearer";
            /** @description The trial just joined, so the app can open it. */
            trialId: number;
            user: components["schemas"]["PublicUserDto"];
        };
        InvitationDto: {
            email: string;
            /** Format: date-time */
            expiresAt: string;
            id: number;
            invitedByName: string | null;
            role: components["schemas"]["TrialRole"];
            /** Format: date-time */
            sentAt: string;
            siteId: number | null;
            siteName: string | null;
            /** @enum {string} */
            status: "pending" | "accepted" | "revoked" | "expired";
        };
        InvitationPreviewDto: {
            /** @description True when an account with this e-mail exists: the invitee joins with it instead of creating one. */
            accountExists: boolean;
            email: string;
            /** Format: date-time */
            expiresAt: string;
            invitedByName: string | null;
            role: components["schemas"]["TrialRole"];
            siteName: string | null;
            trialCode: string;
            trialTitle: string;
        };
        LabelledValueDto: {
            /**
             * @description Block label, nested within its site (rcbd, multisite-rcbd).
             * @example 1
             */
            block?: string;
            /** @example Hollow Lane */
            site?: string;
            /** @example CMP */
            treatment: string;
            /** @example 3 */
            value: number | string;
        };
        LayoutImpactDto: {
            /** @description Sites whose layout would be cleared. */
            layouts: number;
            plots: number;
            /** @description Why the change would be refused (values recorded), or null. */
            refusal: string | null;
            /** @description The sites with a layout among those the change touches. */
            sites: components["schemas"]["LayoutImpactSiteDto"][];
            /** @example Clears the layouts of 3 sites, 60 plots: each site must be randomized again and its printed sheets and labels made anew. */
            summary: string;
            values: number;
        };
        LayoutImpactSiteDto: {
            /** @description Plots of the site’s layout. */
            plots: number;
            siteId: number;
            /** @example Hollow Lane */
            siteName: string;
            /** @description Values recorded on those plots (missing values with their reason included). */
            values: number;
        };
        LettersByMethodDto: {
            /** @description Treatment → compact letters ("a", "ab", …). */
            bonferroni?: {
                [key: string]: string;
            };
            /** @description Treatment → compact letters ("a", "ab", …). */
            holm?: {
                [key: string]: string;
            };
            /** @description Treatment → compact letters ("a", "ab", …). */
            lsd?: {
                [key: string]: string;
            };
            /** @description Treatment → compact letters ("a", "ab", …). */
            tukey?: {
                [key: string]: string;
            };
        };
        LevelAmountDto: {
            appliedTo: components["schemas"]["AppliedUnit"];
            factorId: number;
            factorName: string;
            levelCode: string;
            levelId: number;
            levelName: string;
            perUnit: components["schemas"]["DoseAnswerDto"] | null;
            /** @description Measured plots one unit covers; 1 for a plot. */
            plotsPerUnit: number;
            /** @description Why no amount could be worked out (a rate the site's geometry cannot take). */
            problem: string | null;
            siteId: number;
            /** @description All the site's units of this level, with the margin. */
            siteTotal: components["schemas"]["SiteTotalDto"] | null;
            /** @description Surface of one unit: the site's plot area × plotsPerUnit. */
            unitAreaM2: number;
            /** @description Units of this level at the site. */
            units: number;
        };
        LikelihoodRatioTestDto: {
            /** @example 18.2 */
            chiSquare: number;
            /** @example 4 */
            df: number;
            /** @example 0.0011 */
            p: number | null;
            /**
             * @description 'site' (dropped with its blocks), 'block', 'block:site', 'treatment'.
             * @example treatment
             */
            term: string;
        };
        LoginDto: {
            /** @example investigator@example.org */
            email: string;
            /** @example friable-demo */
            password: string;
        };
        LoginResponseDto: {
            /** @description Short-lived access token (JWT, HS256) for the Authorization: Bearer header. */
            accessToken: string;
            /** @description Seconds until the access token expires; sign in again after that. */
            expiresIn: number;
            /** @enum {string} */
            tokenType: "Bearer";
            user: components["schemas"]["PublicUserDto"];
        };
        LogRankDto: {
            /** @example 14.2 */
            chiSquare: number;
            /** @example 4 */
            df: number;
            /** @example 0.0067 */
            p: number;
            /**
             * @description Number of strata (blocks, or site × block) the test was summed over.
             * @example 14
             */
            strata: number;
        };
        LsMeanDto: {
            /** @description With a transform: the mean back on the original scale. */
            backTransformedMean?: number;
            mean: number;
            n: number;
            se: number;
            treatment: string;
        };
        MeanPairDto: {
            a: string;
            b: string;
            /** @description mean a − mean b */
            diff: number;
            lower: number;
            /** @description Unadjusted for LSD, adjusted otherwise. */
            p: number;
            se: number;
            significant: boolean;
            upper: number;
        };
        MeansOverTimePointDto: {
            dayOffset: number;
            means: components["schemas"]["LsMeanDto"][];
            roundId: number;
            roundLabel: string;
            /** @description Why a round with data could not be analysed (the engine's sentence). */
            unavailable?: string;
        };
        MeasureConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["MeasureDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        MeasureDto: {
            code: string;
            /** @description Cut-off in the measure's unit (kind 'time-with-cutoff'). */
            cutoff: number | null;
            decimals: number;
            /** @description Above it a value is refused. */
            hardMax: number | null;
            /** @description Below it a value is refused. */
            hardMin: number | null;
            higherIsBetter: boolean;
            id: number;
            kind: components["schemas"]["MeasureKind"];
            name: string;
            /** @description Above it a value is accepted with a warning. */
            plausibleMax: number | null;
            /** @description Below it a value is accepted with a warning. */
            plausibleMin: number | null;
            position: number;
            /** @description Highest score (kind 'score'). */
            scaleMax: number | null;
            /** @description Lowest score (kind 'score'). */
            scaleMin: number | null;
            /** @description An id from @friable/field's MEASURE_UNITS. */
            unit: string;
            /** @description Bumped by every save; send it back with each edit: another one answers 409 with the current record. */
            version: number;
        };
        /** @enum {string} */
        MeasureKind: "continuous" | "count" | "score" | "time-with-cutoff";
        MedianTimeDto: {
            /** @example 150 */
            lower: number | null;
            /**
             * @description Null: not reached.
             * @example 212
             */
            median: number | null;
            /** @example GYP */
            treatment: string;
            /** @example 300 */
            upper: number | null;
        };
        MemberDto: {
            email: string;
            membershipId: number;
            name: string;
            role: components["schemas"]["TrialRole"];
            /** Format: date-time */
            since: string;
            siteId: number | null;
            siteName: string | null;
            userId: number;
        };
        MethodComparisonSetDto: {
            /** @description On the scale of diff/se: t (LSD), q/√2 (Tukey), Dunnett's d, Bonferroni t; null for Holm. */
            critical: number | null;
            /** @description critical × se when every pair has the same se, else null. */
            leastSignificantDifference: number | null;
            pairs: components["schemas"]["MeanPairDto"][];
        };
        MissingReasonCountDto: {
            count: number;
            reason: string;
        };
        MissingSummaryDto: {
            count: number;
            reasons: components["schemas"]["MissingReasonCountDto"][];
        };
        ModelChoiceDto: {
            /** @description The analysis of this answer. */
            analysis: components["schemas"]["FindingsAnalysis"];
            /** @description The analysis made for the measure. */
            defaultAnalysis: components["schemas"]["FindingsAnalysis"];
            options: components["schemas"]["AnalysisOptionDto"][];
            /** @description Which model and why, in plain words. */
            why: string;
        };
        ModelChoicesDto: {
            alpha: number;
            analysis: components["schemas"]["FindingsAnalysis"];
            /** @enum {string} */
            covariance?: "cs" | "ar1" | "unstructured" | "auto";
            covariateMeasureId?: number;
            covariateRoundId?: number;
            /** @enum {string} */
            distribution?: "weibull" | "lognormal" | "loglogistic";
            /** @enum {string} */
            family?: "auto" | "poisson" | "quasipoisson";
            measureId: number;
            method: components["schemas"]["SeparationMethod"];
            roundId: number;
            siteId: number | null;
        };
        ModelCoefficientDto: {
            /** @example -0.21 */
            estimate: number;
            /** @example 0.08 */
            se: number;
            /** @example treatment[GYP] */
            term: string;
        };
        ModelFindingsContextDto: {
            censored: components["schemas"]["CensoredSummaryDto"];
            choices: components["schemas"]["ModelChoicesDto"];
            controlCode: string | null;
            /** @description SHA-256 (hex) of the canonical JSON of the observations sent to the engine. */
            dataHash: string;
            /** @description The observations sent, in the engine’s order. */
            engineObservations: {
                [key: string]: unknown;
            }[];
            /** @description The body sent to the stateless endpoint, without observations. */
            engineRequest: {
                [key: string]: unknown;
            };
            engineVersion: string;
            measure: components["schemas"]["FindingsMeasureDto"];
            missing: components["schemas"]["MissingSummaryDto"];
            modelChoice: components["schemas"]["ModelChoiceDto"];
            notices: string[];
            /** @description The rows behind engineObservations, in the same order. */
            observations: components["schemas"]["ModelObservationRowDto"][];
            /** @description The round analysed (rounds over time: the latest used). */
            round: components["schemas"]["RoundRefDto"];
            /** @description Rounds over time: the rounds used, in time order. */
            rounds?: components["schemas"]["RoundRefDto"][];
            scope: components["schemas"]["FindingsScopeDto"];
            trialCode: string;
            trialId: number;
        };
        ModelObservationRowDto: {
            block: number;
            censored: boolean;
            /** @description Analysis of covariance: the plot’s covariate (stored decimal text). */
            covariate?: string;
            /** @description Factorial and split designs: the level code of each factor, by factor name. */
            factors?: {
                [key: string]: string;
            };
            observationId: number;
            plotLabel: string;
            /** @description Rounds over time: the round of the value. */
            roundLabel?: string;
            siteName: string;
            /** @description Treatment code (the label the engine sees). */
            treatment: string;
            /** @description The stored decimal text (censored values: the cut-off value). */
            value: string;
        };
        ModelRankTestDto: {
            df: number | null;
            p: number | null;
            statistic: number | null;
            /** @enum {string} */
            test: "friedman" | "kruskal-wallis";
            /** @description Why the rank test could not run. */
            unavailable?: string;
        };
        MySettingsDto: {
            /** @description An e-mailed receipt after each upload. */
            emailReceipts?: boolean;
            /** @description E-mails when a round is due at one’s sites. */
            emailReminders?: boolean;
            /**
             * @description BCP 47 tag for numbers and dates (de-DE writes 1,5); null follows the browser.
             * @example de-DE
             */
            locale?: string | null;
            /**
             * @description Display name, shown on the Team, in the Activity and on sign-offs.
             * @example Robin Ash
             */
            name?: string;
        };
        NotDrainedCurveDto: {
            /** @description Plots not drained by the cut-off. */
            censored: number;
            plots: number;
            steps: components["schemas"]["NotDrainedStepDto"][];
            treatment: string;
        };
        NotDrainedStepDto: {
            atRisk: number;
            events: number;
            /** @description Share in [0, 1] of the treatment's plots not yet drained at this time. */
            share: number;
            /** @description Time in the measure's unit. */
            time: number;
        };
        ObservationDto: {
            /**
             * @description Block label, nested within its site.
             * @example 1
             */
            block?: string;
            /**
             * @description A baseline covariate (e.g. the plot’s day-0 value): the answer becomes an analysis of covariance (covariate row, adjusted means, slopes).
             * @example 10.8
             */
            covariate?: number | string;
            /**
             * @description factorial-rcbd: the level of each factor, in place of treatment
             * @example {
             *       "A": "a1",
             *       "B": "b2"
             *     }
             */
            factors?: {
                [key: string]: string;
            };
            /** @example North */
            site?: string;
            /** @example CTRL */
            treatment?: string;
            /**
             * @description A JSON number, or decimal text (analysed exactly); null for a plot not measured, left out (the answer says how many were).
             * @example 12.3
             */
            value: (number | string) | null;
        };
        ObservationHistoryEntryDto: {
            after: string | null;
            /** Format: date-time */
            at: string;
            before: string | null;
            by: string | null;
            /** @enum {string} */
            source: "upload" | "edit";
        };
        OrdinalAnswerDto: {
            adjustment: string;
            /**
             * @example [
             *       "1",
             *       "2",
             *       "3",
             *       "4",
             *       "5"
             *     ]
             */
            categories: string[];
            /** @description Log-odds of a higher score (treatment contrasts against the control). */
            coefficients: components["schemas"]["ModelCoefficientDto"][];
            /** @example CTRL */
            control: string;
            logLik: number;
            /** @description Odds of a higher score than the control’s. */
            oddsRatios: components["schemas"]["ControlRatioDto"][];
            probabilities: components["schemas"]["CategoryShareDto"][];
            rankTest: components["schemas"]["ModelRankTestDto"];
            tests: components["schemas"]["LikelihoodRatioTestDto"][];
            thresholds: components["schemas"]["ThresholdDto"][];
            warnings: string[];
        };
        OrdinalFindingsDto: {
            adjustment: string;
            /** @enum {string} */
            analysis: "ordinal";
            /**
             * @example [
             *       "1",
             *       "2",
             *       "3",
             *       "4",
             *       "5"
             *     ]
             */
            categories: string[];
            /** @description Log-odds of a higher score (treatment contrasts against the control). */
            coefficients: components["schemas"]["ModelCoefficientDto"][];
            context: components["schemas"]["ModelFindingsContextDto"];
            /** @example CTRL */
            control: string;
            logLik: number;
            /** @description Odds of a higher score than the control’s. */
            oddsRatios: components["schemas"]["ControlRatioDto"][];
            probabilities: components["schemas"]["CategoryShareDto"][];
            rankTest: components["schemas"]["ModelRankTestDto"];
            tests: components["schemas"]["LikelihoodRatioTestDto"][];
            thresholds: components["schemas"]["ThresholdDto"][];
            warnings: string[];
        };
        OrdinalRequestDto: {
            /**
             * @description The reference of the odds ratios; default the first treatment.
             * @example CTRL
             */
            control?: string;
            /** @enum {string} */
            design: "crd" | "rcbd" | "multisite-rcbd";
            /** @description value: the score. */
            observations: components["schemas"]["LabelledValueDto"][];
        };
        OutboxMessageDto: {
            from: string;
            html: string | null;
            id: string;
            /** Format: date-time */
            receivedAt: string;
            subject: string;
            text: string;
            to: string[];
        };
        OverdispersionDto: {
            /** @example 66 */
            df: number;
            /** @example 0.0048 */
            p: number;
            /** @example 99.5 */
            pearsonChiSquare: number;
            /** @example true */
            present: boolean;
        };
        PasswordChangeDto: {
            /** @description The password in use now. */
            currentPassword: string;
            /** @description At least 12 characters; not a common password. */
            newPassword: string;
        };
        PasswordResetConfirmDto: {
            /** @description The new password: at least 12 characters; not a common password. */
            password: string;
            /** @description The secret at the end of the e-mailed link APP_URL/reset-password/<token>. */
            token: string;
        };
        PasswordResetRequestDto: {
            /** @example investigator@example.org */
            email: string;
        };
        PercentOfControlDto: {
            /** @description mean / control mean × 100; null without a control or when the control mean is 0. */
            percent: number | null;
            treatment: string;
        };
        PlotAmountDto: {
            perPlot: components["schemas"]["DoseAnswerDto"] | null;
            plots: number;
            siteId: number;
            /** @description All the site's plots of this treatment, with the margin. */
            siteTotal: components["schemas"]["SiteTotalDto"] | null;
            treatmentCode: string;
            treatmentId: number;
        };
        PlotDto: {
            block: number;
            id: number;
            /** @example HL-101 */
            label: string;
            position: number;
            siteId: number;
            siteName: string;
            /** @description Split designs: the sub plot within its whole plot, from 1. */
            subPlot: number | null;
            /** @description Split-split plot: the sub-sub plot within its sub plot, from 1. */
            subSubPlot: number | null;
            treatmentCode: string;
            treatmentId: number;
            /** @description Split designs: the whole plot within its block, from 1. */
            wholePlot: number | null;
            /**
             * @description Split designs: the label of the whole plot the plot lies in.
             * @example HL-B2-W3
             */
            wholePlotLabel: string | null;
        };
        PlotPhotoDto: {
            /** @enum {string} */
            contentType: "image/jpeg" | "image/png";
            plotId: number;
            roundId: number;
            sizeBytes: number;
            /** Format: date-time */
            uploadedAt: string;
            uploadedById: number | null;
        };
        PowerAnswerDto: {
            /** @description Blocks per site: as given, or the fewest reaching targetPower. */
            blocks: number;
            /** @description With blocks given: numerator degrees of freedom. */
            df1?: number;
            /** @description With blocks given: denominator degrees of freedom. */
            df2?: number;
            /** @description With blocks given: the noncentrality of the F distribution. */
            noncentrality?: number;
            /** @description Power of the treatment F test with that many blocks. */
            power: number;
        };
        PowerRequestDto: {
            /** @default 0.05 */
            alpha?: number;
            /**
             * @description Blocks per site; leave out together with targetPower to get the blocks needed.
             * @example 4
             */
            blocks?: number;
            /**
             * @description Coefficient of variation, %.
             * @example 15
             */
            cv: number;
            /**
             * @description Smallest difference worth detecting between two treatment means, % of the mean.
             * @example 20
             */
            difference: number;
            /**
             * @description Number of sites the trial runs at.
             * @default 1
             */
            sites?: number;
            /**
             * @description With this and without blocks: answers the smallest number of blocks reaching it.
             * @example 0.8
             */
            targetPower?: number;
            /**
             * @description Number of treatments, including the control.
             * @example 5
             */
            treatments: number;
        };
        ProblemDetailDto: {
            /** @description A column header of an uploaded file. */
            column?: string;
            /** @description The field as the request names it. */
            field?: string;
            message: string;
            /** @description A row of an uploaded file as a spreadsheet numbers it (the header is row 1). */
            row?: number;
        };
        ProblemDto: {
            /** @example Unprocessable Entity */
            error: string;
            /** @description Each problem by field, or by row and column of a file. */
            errors?: components["schemas"]["ProblemDetailDto"][];
            /** @description A sentence for people. */
            message: string;
            /** @example 422 */
            statusCode: number;
        };
        PublicUserDto: {
            /** Format: date-time */
            createdAt: string;
            email: string;
            /** @description E-mailed receipts after an upload. */
            emailReceipts: boolean;
            /** @description E-mails about rounds due at the person’s sites. */
            emailReminders: boolean;
            id: number;
            isActive: boolean;
            isAdmin: boolean;
            /** Format: date-time */
            lastSignInAt: string | null;
            /**
             * @description BCP 47 tag for numbers and dates; null follows the browser.
             * @example de-DE
             */
            locale: string | null;
            /** @description Display name. */
            name: string;
        };
        RandomizeSiteDto: {
            /**
             * @description Seed text; the trial's seed when left out.
             * @example clay-2026
             */
            seed?: string;
        };
        RankTestAnswerDto: {
            /** @description Friedman only. */
            blocksUsed?: number;
            df: number;
            /** @description Friedman only: incomplete blocks left out. */
            droppedBlocks?: string[];
            p: number;
            statistic: number;
        };
        RankTestRequestDto: {
            /** @description Friedman needs treatment and block; Kruskal–Wallis needs treatment. */
            observations: components["schemas"]["ObservationDto"][];
        };
        /** @enum {string} */
        RateBasis: "area" | "concentration";
        RatePerSquareMetreDto: {
            /** @enum {string} */
            unit: "g/m2" | "L/m2";
            value: number;
        };
        /** @enum {string} */
        RateUnitId: "lb/100ft2" | "lb/1000ft2" | "lb/acre" | "g/m2" | "kg/m2" | "kg/ha" | "t/ha" | "ton/acre" | "in" | "cm" | "yd3/1000ft2";
        RecordedObservationConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["RecordedObservationDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        RecordedObservationDto: {
            block: number;
            /** @description Right-censored at valueText (e.g. not drained by the cut-off). */
            censored: boolean;
            id: number;
            measureCode: string;
            measureId: number;
            missingReason: string | null;
            notes: string | null;
            plotId: number;
            plotLabel: string;
            /** Format: date-time */
            recordedAt: string;
            recordedBy: string | null;
            recordedById: number | null;
            roundId: number;
            roundLabel: string;
            siteId: number;
            siteName: string;
            treatmentCode: string;
            valueNumber: number | null;
            /** @description Exactly as typed and stored (decimal text); null when missing. */
            valueText: string | null;
            version: number;
        };
        RemovalImpactDto: {
            censored: number;
            /** @description True when data would be archived: the DELETE then needs the trial code typed, sent as confirm. */
            confirmationNeeded: boolean;
            /** @example measure DT (Drain time) */
            item: string;
            missing: number;
            notes: number;
            photos: number;
            /** @description Why the removal is refused whatever is typed (the only measure of a round), or null. */
            refusal: string | null;
            /** @description The sites holding its data. */
            sites: components["schemas"]["RemovalImpactSiteDto"][];
            /** @example Removes 240 recorded values and 12 notes of Drain time across 3 sites (30 censored). They are archived: kept on record, but no longer shown in the Ledger, Findings, exports or reports. */
            summary: string;
            values: number;
        };
        RemovalImpactSiteDto: {
            censored: number;
            /** @description Values recorded as missing, with their reason. */
            missing: number;
            /** @description Values that carry a note. */
            notes: number;
            /** @description Plot photos of the round (0 for a measure). */
            photos: number;
            siteId: number;
            /** @example Hollow Lane */
            siteName: string;
            /** @description Values recorded (censored ones and missing ones with their reason included). */
            values: number;
        };
        RepeatedAnswerDto: {
            anova: components["schemas"]["TermTestDto"][];
            byRound: components["schemas"]["RoundTestDto"][];
            candidates: components["schemas"]["CovarianceChoiceDto"][];
            covariance: components["schemas"]["CovarianceChoiceDto"];
            means: components["schemas"]["RepeatedMeanDto"][];
            plots: number;
            rounds: components["schemas"]["RoundDto"][];
            sphericity: components["schemas"]["SphericityDto"] | null;
            splitPlot: components["schemas"]["SplitPlotDto"] | null;
            warnings: string[];
        };
        RepeatedFindingsDto: {
            /** @enum {string} */
            analysis: "repeated";
            anova: components["schemas"]["TermTestDto"][];
            byRound: components["schemas"]["RoundTestDto"][];
            candidates: components["schemas"]["CovarianceChoiceDto"][];
            context: components["schemas"]["ModelFindingsContextDto"];
            covariance: components["schemas"]["CovarianceChoiceDto"];
            means: components["schemas"]["RepeatedMeanDto"][];
            plots: number;
            rounds: components["schemas"]["RoundDto"][];
            sphericity: components["schemas"]["SphericityDto"] | null;
            splitPlot: components["schemas"]["SplitPlotDto"] | null;
            warnings: string[];
        };
        RepeatedMeanDto: {
            df: number;
            mean: number;
            /** @example Day 14 */
            round: string;
            /** @description Kenward–Roger standard error. */
            se: number;
            /** @example GYP */
            treatment: string;
        };
        RepeatedObservationDto: {
            /**
             * @description Block label, nested within its site; in a crd it names the replicate. A plot is site + block + treatment.
             * @example 1
             */
            block?: string;
            /** @example Day 14 */
            round: string;
            /** @example Hollow Lane */
            site?: string;
            /**
             * @description The round’s day offset.
             * @example 14
             */
            time: number | string;
            /** @example GYP */
            treatment: string;
            /**
             * @description null for a plot not measured at that round, left out (the answer says how many were).
             * @example 212.5
             */
            value: (number | string) | null;
        };
        RepeatedRequestDto: {
            /**
             * @description Listed first; default the first treatment.
             * @example CTRL
             */
            control?: string;
            /**
             * @description Within-plot covariance: compound symmetry, continuous-time AR(1) on the day offsets, unstructured, or auto (lowest AIC).
             * @enum {string}
             */
            covariance: "cs" | "ar1" | "unstructured" | "auto";
            /** @enum {string} */
            design: "crd" | "rcbd" | "multisite-rcbd";
            observations: components["schemas"]["RepeatedObservationDto"][];
        };
        ReportMeanDto: {
            /** @description With a transform: the mean back on the original scale. */
            backTransformedMean?: number;
            /** @description Dunnett only: whether the mean differs from the control’s (null for the control and other methods). */
            differsFromControl: boolean | null;
            letters: string | null;
            mean: number;
            n: number;
            percentOfControl: number | null;
            se: number;
            treatment: string;
        };
        ReportMeasureDto: {
            alpha: number;
            anova: components["schemas"]["AnovaTableRowDto"][] | null;
            means: components["schemas"]["ReportMeanDto"][];
            measure: components["schemas"]["MeasureDto"];
            method: components["schemas"]["SeparationMethod"];
            /** @description The model made for the measure (Findings’ default); null when that is the classical ANOVA above. */
            model: components["schemas"]["ReportModelDto"] | null;
            rankTest: components["schemas"]["FindingsRankTestDto"] | null;
            /** @description The round chosen, else the latest round with data for the measure; null when there is none. */
            round: components["schemas"]["RoundRefDto"] | null;
            /** @description The site reported, or "all sites combined". */
            scopeLabel: string;
            summary: components["schemas"]["AnovaSummaryDto"] | null;
            /** @description Why there is no analysis (no data yet, or the engine's sentence). */
            unavailable: string | null;
            /** @description Engine warnings and notices of this measure. */
            warnings: string[];
        };
        ReportModelDto: {
            analysis: components["schemas"]["FindingsAnalysis"];
            /** @description The choices it ran with: GET /findings with them gives the same numbers. */
            choices: components["schemas"]["SavedAnalysisChoicesDto"];
            /** @example Not-drained curves and time ratios */
            label: string;
            notices: string[];
            tables: components["schemas"]["ReportTableDto"][];
            /** @description Which model and why, in plain words. */
            why: string;
        };
        ReportOpenCommentDto: {
            authorName: string | null;
            body: string;
            /** Format: date-time */
            createdAt: string;
            id: number;
            replyCount: number;
        };
        ReportReviewDto: {
            analysisId: number;
            measureName: string;
            openComments: components["schemas"]["ReportOpenCommentDto"][];
            review: components["schemas"]["ReviewStatusDto"];
            roundLabel: string;
            scopeLabel: string;
            signOffs: components["schemas"]["SignOffDto"][];
            title: string;
        };
        ReportTableDto: {
            columns: string[];
            /** @description Rows, each cell in the order of columns. */
            rows: ((string | number) | null)[][];
            /** @example Time ratios to CTL */
            title: string;
        };
        ResidualPointDto: {
            fitted: number;
            /** @description |standardized| > 3. */
            flagged: boolean;
            /** @description Index of the observation in the list given to the engine. */
            index: number;
            residual: number;
            /** @description Null for a plot with leverage 1. */
            standardized: number | null;
        };
        ReviewRequestAnswerDto: {
            /** @description The reviewers who were e-mailed. */
            notified: string[];
            /** Format: date-time */
            requestedAt: string;
        };
        ReviewRequestInputDto: {
            /** @description A note for the reviewers, included in the e-mail. */
            message?: string | null;
        };
        ReviewStatusDto: {
            awaiting: string[];
            expected: number;
            /**
             * @description The trial’s reviewers sign; its investigators when it has no reviewer.
             * @enum {string}
             */
            expectedRole: "reviewer" | "investigator";
            /** @example Signed by 1 of 2 reviewers */
            label: string;
            /** Format: date-time */
            lastRequestedAt: string | null;
            signed: number;
        };
        RoundDto: {
            /** @example Day 14 */
            round: string;
            /** @example 14 */
            time: number;
        };
        RoundRefDto: {
            dayOffset: number;
            id: number;
            label: string;
        };
        RoundTestDto: {
            /**
             * @description Kenward–Roger denominator df.
             * @example 104.3
             */
            denDf: number;
            /** @example 2.4 */
            f: number;
            /** @example 8 */
            numDf: number;
            /** @example 0.02 */
            p: number;
            /** @example Day 14 */
            round: string;
            /** @example treatment:round */
            term: string;
        };
        SavedAnalysisChoicesDto: {
            alpha: number;
            analysis: components["schemas"]["FindingsAnalysis"];
            /** @enum {string} */
            covariance?: "cs" | "ar1" | "unstructured" | "auto";
            covariateMeasureId?: number;
            covariateRoundId?: number;
            /** @enum {string} */
            distribution?: "weibull" | "lognormal" | "loglogistic";
            /** @enum {string} */
            family?: "auto" | "poisson" | "quasipoisson";
            forceLsd: boolean;
            measureId: number;
            method: components["schemas"]["SeparationMethod"];
            roundId: number;
            /** @description null = all sites combined. */
            siteId: number | null;
            /** @enum {string} */
            sitesAre: "random" | "fixed";
            transform: components["schemas"]["AnalysisTransform"];
        };
        /** @enum {string} */
        SeparationMethod: "lsd" | "tukey" | "dunnett" | "bonferroni" | "holm";
        SessionsEndedDto: {
            message: string;
            sessionsEnded: number;
        };
        ShapiroWilkDto: {
            p: number;
            w: number;
        };
        SignOffAmendDto: {
            /** @example I checked the layout, the data at both sites and the model again after the plot notes were added. */
            statement: string;
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
        };
        SignOffConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["SignOffDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        SignOffDto: {
            /**
             * Format: date-time
             * @description When its author last amended the statement.
             */
            amendedAt: string | null;
            analysisId: number;
            /** @description SHA-256 of the data the analysis used when signed. */
            dataHash: string;
            engineVersion: string;
            id: number;
            /** @description The signer’s name when they signed. */
            name: string;
            role: components["schemas"]["TrialRole"];
            /** Format: date-time */
            signedAt: string;
            /** @description `data-changed`: the trial’s data moved on after this sign-off; `withdrawn`: its author took it back (it no longer counts). */
            state: components["schemas"]["SignOffState"];
            statement: string;
            userId: number | null;
            /**
             * @description The edit version: sent back with an amendment or the withdrawal.
             * @example 1
             */
            version: number;
            withdrawalReason: string | null;
            /** Format: date-time */
            withdrawnAt: string | null;
        };
        SignOffInputDto: {
            /** @example I checked the layout, the data at both sites and the model; the conclusions follow from them. */
            statement: string;
        };
        /**
         * @description `data-changed`: the trial’s data moved on after this sign-off; `withdrawn`: its author took it back (it no longer counts).
         * @enum {string}
         */
        SignOffState: "current" | "data-changed" | "withdrawn";
        SignOffWithdrawDto: {
            /** @example The drainage notes for block 2 arrived after I signed; I want to read them first. */
            reason: string;
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
        };
        SiteConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["SiteDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        SiteCurvesDto: {
            curves: components["schemas"]["CurveDto"][];
            medians: components["schemas"]["MedianTimeDto"][];
            /** @example Hollow Lane */
            site: string;
        };
        SiteDto: {
            /** @description Computed from the geometry. */
            areaM2: number;
            blocks: number;
            containerDepthCm: number | null;
            /** @description Inside diameter at the soil surface, for round plots or containers. */
            diameterCm: number | null;
            hasObservations: boolean;
            id: number;
            /** @description Two or three capital letters starting every plot label at this site, unique in the trial. */
            labelPrefix: string;
            leadName: string | null;
            leadUserId: number | null;
            lengthM: number | null;
            location: string | null;
            name: string;
            /** @description Plots at the site, 0 until randomized. */
            plotCount: number;
            /** @description The seed text used for the current layout. */
            randomizationSeed: string | null;
            /** Format: date-time */
            randomizedAt: string | null;
            /** @enum {string} */
            shape: "rectangle" | "round";
            soilDescription: string | null;
            soilVolumeL: number | null;
            /** @description The error strata of the design at this site. */
            strata: components["schemas"]["ErrorStratumDto"][];
            /** @description Bumped by every save; send it back with each edit: another one answers 409 with the current record. */
            version: number;
            /** @description Guardrail sentences: fewer than 4 blocks, error df below 12 in any stratum, one treatment. */
            warnings: string[];
            widthM: number | null;
        };
        SiteTotalDto: {
            grams: number | null;
            litres: number | null;
        };
        SliceTestDto: {
            comparisons: components["schemas"]["ComparisonsByMethodDto"];
            denDf: number;
            df: number;
            /** @description The error the differences are judged against: 'block:A', 'error', 'block:A and error (Satterthwaite)', 'Kenward–Roger'. */
            errorTerm: string;
            f: number;
            /** @description The factor tested. */
            factor: string;
            letters: components["schemas"]["LettersByMethodDto"];
            level: string;
            means: components["schemas"]["FactorialMeanDto"][];
            numDf: number;
            p: number;
            /** @description The factor whose level is held. */
            within: string;
        };
        SnapshotCommentConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["SnapshotCommentDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        SnapshotCommentDto: {
            analysisId: number;
            authorId: number | null;
            authorName: string | null;
            /** @description Empty once deleted (the earlier text stays in revisions). */
            body: string;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            deletedAt: string | null;
            /** Format: date-time */
            editedAt: string | null;
            id: number;
            /** @description The comment this one replies to. */
            parentId: number | null;
            /** Format: date-time */
            resolvedAt: string | null;
            resolvedByName: string | null;
            /** @description Earlier texts, oldest first. */
            revisions: components["schemas"]["CommentRevisionDto"][];
            /**
             * @description The edit version: sent back with an edit, a resolution or the deletion.
             * @example 1
             */
            version: number;
        };
        SphericityDto: {
            chiSquare: number | null;
            df: number | null;
            /** @example 0.87 */
            greenhouseGeisser: number;
            /**
             * @description Lecoutre’s form, as car; above 1 it is used as 1.
             * @example 0.98
             */
            huynhFeldt: number;
            /** @description Null with two rounds. */
            mauchlyW: number | null;
            p: number | null;
        };
        SplitPlotDto: {
            plotsLeftOut: number;
            plotsUsed: number;
            table: components["schemas"]["SplitPlotRowDto"][];
        };
        SplitPlotRowDto: {
            df: number;
            f: number | null;
            ms: number;
            p: number | null;
            pGreenhouseGeisser?: number | null;
            pHuynhFeldt?: number | null;
            ss: number;
            /** @enum {string} */
            stratum: "between plots" | "within plots";
            /** @example treatment:round */
            term: string;
        };
        StratumComparisonSetDto: {
            comparisons: components["schemas"]["ComparisonsByMethodDto"];
            df: number;
            /** @description The error the differences are judged against: 'block:A', 'error', 'block:A and error (Satterthwaite)', 'Kenward–Roger'. */
            errorTerm: string;
            letters: components["schemas"]["LettersByMethodDto"];
        };
        TermMeansDto: {
            factors: string[];
            means: components["schemas"]["FactorialMeanDto"][];
            /** @example Amendment:Mulch */
            term: string;
        };
        TermTestDto: {
            /**
             * @description Kenward–Roger denominator df.
             * @example 104.3
             */
            denDf: number;
            /** @example 2.4 */
            f: number;
            /** @example 8 */
            numDf: number;
            /** @example 0.02 */
            p: number;
            /** @example treatment:round */
            term: string;
        };
        ThresholdDto: {
            /**
             * @description The cut-point between two neighbouring scores (logit scale).
             * @example 2|3
             */
            between: string;
            /** @example -0.4 */
            estimate: number;
            /** @example 0.3 */
            se: number;
        };
        TreatmentConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["TreatmentDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        TreatmentCountDto: {
            /** @example 12 */
            drained: number;
            /** @example 2 */
            notDrained: number;
            /** @example 14 */
            plots: number;
            /** @example GYP */
            treatment: string;
        };
        TreatmentDto: {
            code: string;
            description: string | null;
            /** @description Factorial and split-plot trials: the level of each factor, in the factors' order. */
            factorLevelIds: number[];
            id: number;
            /** @description Needed when rateBasis is 'concentration'. */
            incorporationDepthCm: number | null;
            isControl: boolean;
            /** @enum {string} */
            materialKind: "gypsum" | "other";
            /** @enum {string} */
            moistureBasis: "as-is" | "dry";
            /** @description Water share of the as-is product for a dry-basis rate, [0, 1). */
            moistureFraction: number | null;
            name: string;
            position: number;
            product: string | null;
            /** @description Share of active material in the product, (0, 1]; null = the rate is for the product as sold. */
            purity: number | null;
            rateBasis: components["schemas"]["RateBasis"];
            rateUnit: components["schemas"]["RateUnitId"] | null;
            /** @description null for an untreated control or a treatment without an applied material. */
            rateValue: number | null;
            /** @description Bumped by every save; send it back with each edit: another one answers 409 with the current record. */
            version: number;
        };
        /** @enum {string} */
        TrialDesign: "crd" | "rcbd" | "factorial-crd" | "factorial-rcbd" | "split-plot" | "split-split-plot";
        TrialDetailConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["TrialDetailDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        TrialDetailDto: {
            activation: components["schemas"]["ActivationCheckDto"];
            code: string;
            design: components["schemas"]["TrialDesign"];
            factors: components["schemas"]["TrialFactorDto"][];
            id: number;
            measures: components["schemas"]["MeasureDto"][];
            myRoles: components["schemas"]["TrialRole"][];
            /** @description Sites a collaborator caller is assigned to. */
            mySiteIds: number[];
            noControlReason: string | null;
            ownerId: number | null;
            question: string | null;
            rounds: components["schemas"]["AssessmentRoundDto"][];
            safetyNotes: string | null;
            seed: string;
            sites: components["schemas"]["SiteDto"][];
            /** Format: date */
            startDate: string | null;
            status: components["schemas"]["TrialStatus"];
            title: string;
            treatments: components["schemas"]["TreatmentDto"][];
            /** Format: date-time */
            updatedAt: string;
            /** @description Bumped by every save; send it back with each edit: another one answers 409 with the current record. */
            version: number;
        };
        TrialFactorDto: {
            /** @description Where the levels go on: every plot, or a split plot's whole plots, sub plots or sub-sub plots. */
            appliedTo: components["schemas"]["AppliedUnit"];
            id: number;
            levels: components["schemas"]["TrialFactorLevelDto"][];
            name: string;
            /**
             * @description 1 to 4 in the order given; a split plot's whole-plot factor is 1.
             * @enum {number}
             */
            position: 1 | 2 | 3 | 4;
            /** @description Bumped by every save; send it back with each edit: another one answers 409 with the current record. */
            version: number;
        };
        TrialFactorLevelDto: {
            /** @description 1 to 6 letters or digits, unique within the factor; treatment codes join the level codes. */
            code: string;
            description: string | null;
            id: number;
            /** @description Needed when rateBasis is 'concentration'. */
            incorporationDepthCm: number | null;
            /** @enum {string} */
            materialKind: "gypsum" | "other";
            /** @enum {string} */
            moistureBasis: "as-is" | "dry";
            /** @description Water share of the as-is product for a dry-basis rate, [0, 1). */
            moistureFraction: number | null;
            name: string;
            product: string | null;
            /** @description Share of active material in the product, (0, 1]; null = the rate is for the product as sold. */
            purity: number | null;
            rateBasis: components["schemas"]["RateBasis"];
            rateUnit: components["schemas"]["RateUnitId"] | null;
            /** @description null for an untreated control or a treatment without an applied material. */
            rateValue: number | null;
        };
        TrialFactorListConflict: {
            /** @description The record as it is stored now, with its version. */
            current: components["schemas"]["TrialFactorDto"][];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        TrialProtocolDto: {
            code: string;
            design: components["schemas"]["TrialDesign"];
            factors: components["schemas"]["TrialFactorDto"][];
            id: number;
            measures: components["schemas"]["MeasureDto"][];
            noControlReason: string | null;
            ownerId: number | null;
            question: string | null;
            rounds: components["schemas"]["AssessmentRoundDto"][];
            safetyNotes: string | null;
            seed: string;
            sites: components["schemas"]["SiteDto"][];
            /** Format: date */
            startDate: string | null;
            status: components["schemas"]["TrialStatus"];
            title: string;
            treatments: components["schemas"]["TreatmentDto"][];
            /** Format: date-time */
            updatedAt: string;
            /** @description Bumped by every save; send it back with each edit: another one answers 409 with the current record. */
            version: number;
        };
        TrialReportDto: {
            /** @description Every caution of the report, each sentence naming its measure. */
            cautions: string[];
            engineVersion: string;
            /** @description A short plain paragraph on what the statistics do and do not show. */
            explanation: string;
            /** Format: date-time */
            generatedAt: string;
            measures: components["schemas"]["ReportMeasureDto"][];
            protocol: components["schemas"]["TrialProtocolDto"];
            /** @description Saved analyses with sign-offs (statements and states) or open comments, oldest first. */
            reviews: components["schemas"]["ReportReviewDto"][];
            sites: components["schemas"]["SiteDto"][];
        };
        /**
         * @description The caller's roles on this trial (empty for an administrator without one).
         * @enum {string}
         */
        TrialRole: "investigator" | "collaborator" | "reviewer";
        /** @enum {string} */
        TrialStatus: "draft" | "active" | "locked" | "archived";
        TrialSummaryDto: {
            code: string;
            design: components["schemas"]["TrialDesign"];
            id: number;
            /** @description The caller's roles on this trial (empty for an administrator without one). */
            myRoles: components["schemas"]["TrialRole"][];
            status: components["schemas"]["TrialStatus"];
            title: string;
            /** Format: date-time */
            updatedAt: string;
        };
        UpdateMeasureDto: {
            /**
             * @description Unique in the trial: 1 to 12 letters, digits or dashes.
             * @example DRAIN
             */
            code?: string;
            /** @description Cut-off in the unit (kind time-with-cutoff). */
            cutoff?: number | null;
            /** @default 1 */
            decimals?: number;
            /** @description Above: an error. */
            hardMax?: number | null;
            /** @description Below: an error. */
            hardMin?: number | null;
            /** @description Asked, never assumed: whether a higher value is the better outcome (false for drain times). */
            higherIsBetter?: boolean;
            /** @enum {string} */
            kind?: "continuous" | "count" | "score" | "time-with-cutoff";
            /**
             * @description Unique in the trial (ignoring case): 1 to 80 characters starting with a letter or digit; brackets and units are fine.
             * @example drain time (first pour)
             */
            name?: string;
            /** @description Above: a warning. */
            plausibleMax?: number | null;
            /** @description Below: a warning. */
            plausibleMin?: number | null;
            position?: number;
            /** @description Highest score (kind score). */
            scaleMax?: number | null;
            /** @description Lowest score (kind score). */
            scaleMin?: number | null;
            /**
             * @description A unit Friable converts (@friable/field's MEASURE_UNITS).
             * @example s
             * @enum {string}
             */
            unit?: "s" | "min" | "h" | "mm" | "cm" | "m" | "in" | "ft" | "mL" | "L" | "gal" | "ft3" | "yd3" | "g" | "kg" | "oz" | "lb" | "m2" | "ft2" | "kPa" | "MPa" | "psi" | "kgf/cm2" | "tsf" | "mm/h" | "in/h" | "g/cm3" | "lb/ft3" | "dS/m" | "mS/cm" | "mmho/cm" | "µS/cm" | "score" | "count" | "%" | "ratio";
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
        };
        UpdateMemberDto: {
            /** @description The one role the person holds on the trial from now on. */
            role: components["schemas"]["TrialRole"];
            /** @description The sites of a collaborator (one or more); leave out for other roles. */
            siteIds?: number[];
        };
        UpdateRoundDto: {
            /**
             * @description Days after the trial start date (due date = start date + offset).
             * @example 14
             */
            dayOffset?: number;
            /** @example Day 14 */
            label?: string;
            /** @description The measures taken in this round (at least one). */
            measureIds?: number[];
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
        };
        UpdateSiteDto: {
            /**
             * @description Blocks (replicates for crd).
             * @example 5
             */
            blocks?: number;
            containerDepthCm?: number | null;
            /** @description Round plots or containers: inside diameter at the soil surface. */
            diameterCm?: number | null;
            /**
             * @description Two or three capital letters; made from the name when left out.
             * @example HL
             */
            labelPrefix?: string;
            /** @description A member of the trial who leads the work at this site. */
            leadUserId?: number | null;
            /** @description Rectangle plots. */
            lengthM?: number | null;
            location?: string | null;
            /** @example Hollow Lane Community Garden */
            name?: string;
            /** @enum {string} */
            shape?: "rectangle" | "round";
            soilDescription?: string | null;
            /** @description Soil volume per container, for rates per soil volume. */
            soilVolumeL?: number | null;
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
            /** @description Rectangle plots. */
            widthM?: number | null;
        };
        UpdateTreatmentDto: {
            /**
             * @description Unique in the trial: 1 to 12 letters, digits or dashes.
             * @example G40
             */
            code?: string;
            description?: string | null;
            /** @description Depth the field rate is mixed into (concentration basis). */
            incorporationDepthCm?: number | null;
            /** @default false */
            isControl?: boolean;
            /**
             * @default other
             * @enum {string}
             */
            materialKind?: "gypsum" | "other";
            /**
             * @default as-is
             * @enum {string}
             */
            moistureBasis?: "as-is" | "dry";
            /** @description Water share of the as-is product, at least 0 and below 1. */
            moistureFraction?: number | null;
            /** @example Gypsum 40 lb/1000 ft² */
            name?: string;
            /** @description Order in lists, from 1. */
            position?: number;
            /** @example Garden gypsum, 20 kg bag */
            product?: string | null;
            /** @description Share of active material, above 0 and at most 1. */
            purity?: number | null;
            /**
             * @default area
             * @enum {string}
             */
            rateBasis?: "area" | "concentration";
            /** @enum {string|null} */
            rateUnit?: "lb/100ft2" | "lb/1000ft2" | "lb/acre" | "g/m2" | "kg/m2" | "kg/ha" | "t/ha" | "ton/acre" | "in" | "cm" | "yd3/1000ft2" | null;
            /** @example 40 */
            rateValue?: number | null;
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
        };
        UpdateTrialDto: {
            /**
             * @default rcbd
             * @enum {string}
             */
            design?: "crd" | "rcbd" | "factorial-crd" | "factorial-rcbd" | "split-plot" | "split-split-plot";
            /** @description Why the trial has no untreated control (instead of one). */
            noControlReason?: string | null;
            /** @description The question or hypothesis the trial answers. */
            question?: string | null;
            /** @description Why a locked trial is unlocked (status active); required when any of its saved analyses is signed off. Kept in the activity trail. */
            reason?: string | null;
            safetyNotes?: string | null;
            /**
             * @description Randomization seed text; a random one when left out.
             * @example clay-2026
             */
            seed?: string;
            /** @example 2026-04-01 */
            startDate?: string | null;
            /**
             * @description 'active' only when every activation check passes (422 lists the problems).
             * @enum {string}
             */
            status?: "draft" | "active" | "locked" | "archived";
            /** @example Gypsum and compost on heavy clay */
            title?: string;
            /**
             * @description The version the editor saw (from the GET answer); another one answers 409 with the current record.
             * @example 1
             */
            version: number;
        };
        UpdateUserDto: {
            /** @example robin.ash@example.org */
            email?: string;
            /** @description An e-mailed receipt after each upload. */
            emailReceipts?: boolean;
            /** @description E-mails when a round is due at one’s sites. */
            emailReminders?: boolean;
            /** @description false deactivates the account and ends its sessions; true reactivates it with no session. */
            isActive?: boolean;
            /** @description Instance administrator. */
            isAdmin?: boolean;
            /**
             * @description BCP 47 tag for numbers and dates (de-DE writes 1,5); null follows the browser.
             * @example de-DE
             */
            locale?: string | null;
            /**
             * @description Display name, shown on the Team, in the Activity and on sign-offs.
             * @example Robin Ash
             */
            name?: string;
        };
        VarianceComponentDto: {
            /** @example block:Amendment */
            name: string;
            variance: number;
        };
    };
    responses: never;
    parameters: never;
    requestBodies: never;
    headers: never;
    pathItems: never;
}
export type $defs = Record<string, never>;
export interface operations {
    AuthController_login: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["LoginDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["LoginResponseDto"];
                };
            };
            /** @description Wrong e-mail or password (the same answer for both), or a deactivated account. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Sign-in locked for this account or address after repeated failures; the message says until when, Retry-After how many seconds. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AuthController_logout: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AccountNoticeDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AuthController_logoutAll: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SessionsEndedDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AuthController_me: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The signed-in person, with their locale and e-mail preferences. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublicUserDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AuthController_changePassword: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["PasswordChangeDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AccountNoticeDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The current password is not right. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The new password is too short, too long, common, or one’s own name or e-mail (a sentence). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Sign-in locked for this account or address after repeated failures; the message says until when, Retry-After how many seconds. */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AuthController_requestReset: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["PasswordResetRequestDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AccountNoticeDto"];
                };
            };
        };
    };
    AuthController_confirmReset: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["PasswordResetConfirmDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AccountNoticeDto"];
                };
            };
            /** @description No reset link has this token. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The link was already used or has expired. */
            410: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The new password does not meet the rules (a sentence). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    OutboxController_list: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OutboxMessage[]: e-mails the local SMTP sink caught, newest first. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["OutboxMessageDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /**
             * @description Only an instance administrator may read the Outbox.
             *
             *     Needs an instance administrator.
             */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description NODE_ENV is production: there is no Outbox. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    HealthController_check: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description {"status":"ok","database":"up"} */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["HealthReportDto"];
                };
            };
            /** @description Names what is down. */
            503: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["HealthReportDto"];
                };
            };
        };
    };
    InvitationsController_preview: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                token: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description InvitationPreview: the trial, role and site the link invites to. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationPreviewDto"];
                };
            };
            /** @description No invitation has this link (mistyped, or replaced by a resend). */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The invitation was already used, withdrawn or has expired. */
            410: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    InvitationsController_accept: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                token: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["AcceptInvitationDto"];
            };
        };
        responses: {
            /** @description InvitationAcceptResponse: the existing account joined and is signed in. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationAcceptResponseDto"];
                };
            };
            /** @description InvitationAcceptResponse: a new account was made and is signed in. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationAcceptResponseDto"];
                };
            };
            /** @description The password does not match the existing account, or the account is deactivated. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No invitation has this link. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The invitation was already used, withdrawn or has expired. */
            410: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A name and a password of at least 12 characters (not a common one) are needed for a new account. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    RatesController_dose: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["DoseRequestDto"];
            };
        };
        responses: {
            /** @description DoseAnswer: grams, kilograms, ounces, pounds (litres and gallons for depth rates), warnings. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["DoseAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is missing or out of range; the error names it. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    StatsController_anova: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["AnovaRequestDto"];
            };
        };
        responses: {
            /** @description {anova, summary, means, comparisons, letters, diagnostics, warnings} */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AnovaAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A malformed body (naming the field) or a statistically impossible request (the engine’s sentence). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    StatsController_censored: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CensoredRequestDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["CensoredAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A malformed body (naming the field) or data the analysis cannot take (the engine’s sentence). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    StatsController_counts: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CountsRequestDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["CountsAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A malformed body (naming the field) or data the analysis cannot take (the engine’s sentence). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    StatsController_friedman: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["RankTestRequestDto"];
            };
        };
        responses: {
            /** @description Statistic, df and p; the blocks used and those dropped. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RankTestAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    StatsController_kruskal: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["RankTestRequestDto"];
            };
        };
        responses: {
            /** @description Statistic, df and p. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RankTestAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    StatsController_ordinal: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["OrdinalRequestDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["OrdinalAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A malformed body (naming the field) or data the analysis cannot take (the engine’s sentence). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    StatsController_power: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["PowerRequestDto"];
            };
        };
        responses: {
            /** @description With blocks: the power and its F distribution. With targetPower: the blocks needed and their power. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PowerAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    StatsController_repeated: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["RepeatedRequestDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RepeatedAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A malformed body (naming the field) or data the analysis cannot take (the engine’s sentence). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TrialsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The trials the caller belongs to (every trial for an administrator). */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TrialSummaryDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TrialsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateTrialDto"];
            };
        };
        responses: {
            /** @description The new draft trial; the caller is its investigator. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TrialSummaryDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The code is already used by another trial. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TrialsController_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description TrialDetail: the whole protocol with its activation checks. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TrialDetailDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TrialsController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateTrialDto"];
            };
        };
        responses: {
            /** @description TrialDetail after the change. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TrialDetailDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or the trial is locked, or the status change is not allowed (problem body). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TrialDetailConflict"] | components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong, or (status active) the activation checks fail: errors lists each problem. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    ActivityController_list: {
        parameters: {
            query?: {
                /** @description Only entries of this kind. */
                kind?: string;
                /** @description Only entries about this site. */
                siteId?: number;
                /** @description Only changes made by this person. */
                userId?: number;
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description ActivityEntry[], newest first. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ActivityEntryDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    PlotsController_amounts: {
        parameters: {
            query?: {
                /** @description Extra to prepare for spills and weighing losses, in percent. */
                marginPercent?: number;
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description PlotAmount[]: per site and treatment, the amount for one plot and for the site with the margin. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PlotAmountDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description AnalysisSnapshotSummary[], newest first (without the result), each with its sign-offs and review status. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AnalysisSnapshotSummaryDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateAnalysisDto"];
            };
        };
        responses: {
            /** @description AnalysisSnapshot (dataChanged false). */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AnalysisSnapshotDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A choice refused by name, no data, or the engine’s sentence. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description AnalysisSnapshot: the stored result, never recomputed, with dataChanged when today’s data hash differs. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AnalysisSnapshotDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_listComments: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description SnapshotComment[], oldest first; replies carry parentId; deleted ones keep their place with an empty body. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SnapshotCommentDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_addComment: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CommentInputDto"];
            };
        };
        responses: {
            /** @description SnapshotComment; a reply is e-mailed to the reviewers and the thread’s author; recorded in the activity trail. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SnapshotCommentDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description body empty or too long, or parentId not a comment of this analysis. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_deleteComment: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                commentId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CommentDeleteDto"];
            };
        };
        responses: {
            /** @description Deleted. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or a sentence: it was already deleted. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SnapshotCommentConflict"] | components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_updateComment: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                commentId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CommentUpdateDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SnapshotCommentDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or a sentence: the comment was deleted. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SnapshotCommentConflict"] | components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_requestReview: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ReviewRequestInputDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ReviewRequestAnswerDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial has no reviewer yet. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_signOff: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["SignOffInputDto"];
            };
        };
        responses: {
            /** @description SignOff: name, role, time, statement, data hash and engine version; recorded in the activity trail. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SignOffDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is not locked, the data changed since the analysis was saved, or you already signed it (a sentence). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_withdrawSignOff: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                signOffId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["SignOffWithdrawDto"];
            };
        };
        responses: {
            /** @description The sign-off, now withdrawn. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SignOffDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or a sentence: it was already withdrawn. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SignOffConflict"] | components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    AnalysesController_amendSignOff: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                analysisId: number;
                signOffId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["SignOffAmendDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SignOffDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or a sentence: the sign-off was withdrawn, or the data changed after it. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SignOffConflict"] | components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    ExportsController_dictionary: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Columns: column, meaning, type. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/csv": string;
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    ExportsController_csv: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Columns: trial, site, block, plot_label, treatment, round, measure, unit, value, censored, censor_limit, missing_reason, notes, recorded_by, recorded_at. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/csv": string;
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    ExportsController_workbook: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The workbook, saved under the trial code and date. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet": string;
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    FactorsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The factors with their levels (factorial trials). */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TrialFactorDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    FactorsController_replace: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["FactorsDto"];
            };
        };
        responses: {
            /** @description The factors and the treatments made from every combination of their levels. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FactorsReplacedDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or the trial is locked, is neither factorial nor split plot, or changing the level codes would clear the layout of a site with observations (problem body). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TrialFactorListConflict"] | components["schemas"]["ProblemDto"];
                };
            };
            /** @description A number of factors the design does not take, a factor with fewer than two levels, repeated level codes, or a level rate without its unit. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    FindingsController_get: {
        parameters: {
            query: {
                alpha?: number;
                /** @description Leave out for the model made for the measure: censored (time with a cut-off), ordinal (score), counts (count); a number: ancova with a day-0 baseline and one later round, repeated with two or more rounds, else anova. */
                analysis?: "anova" | "censored" | "repeated" | "ancova" | "ordinal" | "counts";
                /** @description repeated: the within-plot covariance (auto: lowest AIC). */
                covariance?: "cs" | "ar1" | "unstructured" | "auto";
                /** @description ancova: the measure whose values are the covariate; default the analysed measure. */
                covariateMeasureId?: number;
                /** @description ancova: the round whose values are the covariate; default the day-0 round (else the earliest earlier round with values). */
                covariateRoundId?: number;
                /** @description censored: the time-ratio model’s distribution. */
                distribution?: "weibull" | "lognormal" | "loglogistic";
                /** @description counts: auto takes quasi-Poisson when the counts are overdispersed. */
                family?: "auto" | "poisson" | "quasipoisson";
                /** @description Compute Fisher’s LSD even when the treatment F test is not significant. */
                forceLsd?: boolean;
                /** @description The measure to analyse. */
                measureId: number;
                /** @description Mean separation method. */
                method?: "lsd" | "tukey" | "dunnett" | "bonferroni" | "holm";
                /** @description The assessment round to analyse; leave out for the latest round holding values of the measure in this scope. */
                roundId?: number;
                /** @description One site; leave out for all sites combined (a trial with one site: that site). */
                siteId?: number;
                /** @description With all sites combined: random tests treatment against site × treatment. */
                sitesAre?: "random" | "fixed";
                transform?: "none" | "log" | "sqrt" | "arcsine-sqrt";
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Findings (the ANOVA: AnovaAnswer & {context}) or a model’s answer & {analysis, context}. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FindingsDto"] | components["schemas"]["CensoredFindingsDto"] | components["schemas"]["RepeatedFindingsDto"] | components["schemas"]["AncovaFindingsDto"] | components["schemas"]["OrdinalFindingsDto"] | components["schemas"]["CountsFindingsDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description An unknown measure, round or site, no data yet, or the engine’s sentence. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    FindingsController_bundle: {
        parameters: {
            query: {
                alpha?: number;
                /** @description Leave out for the model made for the measure: censored (time with a cut-off), ordinal (score), counts (count); a number: ancova with a day-0 baseline and one later round, repeated with two or more rounds, else anova. */
                analysis?: "anova" | "censored" | "repeated" | "ancova" | "ordinal" | "counts";
                /** @description repeated: the within-plot covariance (auto: lowest AIC). */
                covariance?: "cs" | "ar1" | "unstructured" | "auto";
                /** @description ancova: the measure whose values are the covariate; default the analysed measure. */
                covariateMeasureId?: number;
                /** @description ancova: the round whose values are the covariate; default the day-0 round (else the earliest earlier round with values). */
                covariateRoundId?: number;
                /** @description censored: the time-ratio model’s distribution. */
                distribution?: "weibull" | "lognormal" | "loglogistic";
                /** @description counts: auto takes quasi-Poisson when the counts are overdispersed. */
                family?: "auto" | "poisson" | "quasipoisson";
                /** @description Compute Fisher’s LSD even when the treatment F test is not significant. */
                forceLsd?: boolean;
                /** @description The measure to analyse. */
                measureId: number;
                /** @description Mean separation method. */
                method?: "lsd" | "tukey" | "dunnett" | "bonferroni" | "holm";
                /** @description The assessment round to analyse; leave out for the latest round holding values of the measure in this scope. */
                roundId?: number;
                /** @description One site; leave out for all sites combined (a trial with one site: that site). */
                siteId?: number;
                /** @description With all sites combined: random tests treatment against site × treatment. */
                sitesAre?: "random" | "fixed";
                transform?: "none" | "log" | "sqrt" | "arcsine-sqrt";
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description A zip named after the trial, measure, round and analysis. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/zip": string;
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description As GET /findings. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    FindingsController_summary: {
        parameters: {
            query: {
                /** @description The measure to analyse. */
                measureId: number;
                /** @description The assessment round to analyse; leave out for the latest round holding values of the measure in this scope. */
                roundId?: number;
                /** @description One site; leave out for all sites combined (a trial with one site: that site). */
                siteId?: number;
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FindingsSummaryDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description An unknown measure, round or site, or no values yet. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    IntakeImportsController_remembered: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description What the trial’s uploads read their own column headers as, where someone chose it: the next upload starts from these. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["IntakeColumnChoiceDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    IntakeImportsController_forget: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The remembered column choices are forgotten; headers are matched by their names again. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    IntakeImportsController_recent: {
        parameters: {
            query: {
                /** @description The round of the uploads. */
                roundId: number;
                /** @description The site of the uploads. */
                siteId: number;
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The latest ten uploads sent for a site and round, newest first, running ones with their stage and counts. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["IntakeImportDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    IntakeImportsController_one: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                ticket: string;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One upload: its stage (checking, comparing, writing, then done, refused, failed or interrupted) and counts, then its answer. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["IntakeImportDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /**
             * @description No upload with this ticket in the trial.
             *
             *     No such trial, or you are not a member of it.
             */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TrialInvitationsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Invitation[]: every invitation of the trial, newest first, with its status. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TrialInvitationsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateInvitationDto"];
            };
        };
        responses: {
            /** @description The Invitation; the e-mail has been sent. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The person already holds this role, or has a pending invitation for it. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong, e.g. a collaborator without a site of this trial. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The mail server refused the e-mail; nothing was saved. */
            503: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TrialInvitationsController_revoke: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                invitationId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The Invitation, now withdrawn; its link answers 410. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The invitation was already accepted. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TrialInvitationsController_resend: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                invitationId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The Invitation with a new link and expiry; the earlier link stops working. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The invitation was already accepted or withdrawn. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    LayoutImpactController_get: {
        parameters: {
            query?: {
                /** @description One site (changing its blocks, removing it, randomizing it again); leave out for every site. */
                siteId?: number;
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description LayoutImpact: the sites, plots and values touched, a sentence, and the refusal when values are recorded. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["LayoutImpactDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    PlotsController_levelAmounts: {
        parameters: {
            query?: {
                /** @description Extra to prepare for spills and weighing losses, in percent. */
                marginPercent?: number;
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description LevelAmount[] (factorial and split-plot trials): per site and factor level, the amount for one unit the level is applied to (a plot, or a whole plot of a split plot) and for all of them with the margin. Empty for one-factor designs. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["LevelAmountDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    MeasuresController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The measures in their order. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MeasureDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    MeasuresController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateMeasureDto"];
            };
        };
        responses: {
            /** @description The measure as saved. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MeasureDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong (e.g. the code is already used); nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    MeasuresController_remove: {
        parameters: {
            query?: {
                /** @description The trial code typed to confirm (any case); needed when the removal archives values or photos. */
                confirm?: string;
            };
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The measure was archived, with its recorded values. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked, or it is the only measure of a round. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Values are recorded for it and the trial code was not typed as confirm (or was mistyped); nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    MeasuresController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateMeasureDto"];
            };
        };
        responses: {
            /** @description The measure after the change. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MeasureDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or the trial is locked, or a change of meaning of a measure with observations (problem body). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MeasureConflict"] | components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong; nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    MeasuresController_removalImpact: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description RemovalImpact: values, notes and photos per site, a sentence, whether the trial code must be typed, and a refusal if any. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RemovalImpactDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    MembersController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Member[]: everyone on the trial with their role and, for collaborators, their site. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MemberDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    MembersController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
                userId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Removed. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /**
             * @description The person is not on this trial.
             *
             *     No such trial, or you are not a member of it.
             */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The change would leave the trial without an investigator. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    MembersController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
                userId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateMemberDto"];
            };
        };
        responses: {
            /** @description Member[]: the whole team after the change. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MemberDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /**
             * @description The person is not on this trial.
             *
             *     No such trial, or you are not a member of it.
             */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The change would leave the trial without an investigator. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description role or siteIds wrong (named). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    LedgerController_list: {
        parameters: {
            query?: {
                /** @description Only values of this measure. */
                measureId?: number;
                /** @description Only values of this assessment round. */
                roundId?: number;
                /** @description Only values of this site. */
                siteId?: number;
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Observation[]: each value with its plot, site, block, treatment, round, measure, text and number, censoring, version and who recorded it. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RecordedObservationDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    LedgerController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateObservationDto"];
            };
        };
        responses: {
            /** @description Observation: the value recorded (version 1). */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RecordedObservationDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or the cell already has a value (also with the current value), or the trial is locked (problem body). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RecordedObservationConflict"] | components["schemas"]["ProblemDto"];
                };
            };
            /** @description The value is refused as Intake would refuse it, or it needs acceptWarnings. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    LedgerController_edit: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                observationId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["EditObservationDto"];
            };
        };
        responses: {
            /** @description Observation after the save (version + 1; unchanged when nothing differs). */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RecordedObservationDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or the trial is locked (problem body). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RecordedObservationConflict"] | components["schemas"]["ProblemDto"];
                };
            };
            /** @description The value is refused as Intake would refuse it, or it needs acceptWarnings. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    LedgerController_history: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                observationId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description ObservationHistoryEntry[], oldest first: who, when, before, after, by upload or by edit. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ObservationHistoryEntryDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    PlotsController_list: {
        parameters: {
            query?: {
                /** @description Only the plots of this site. */
                siteId?: number;
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Plot[] in site, block and position order. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PlotDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    PhotosController_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                plotId: number;
                roundId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The image (image/jpeg or image/png), as an attachment named after the plot and round. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "image/jpeg": string;
                    "image/png": string;
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    PhotosController_put: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                plotId: number;
                roundId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /**
                     * Format: binary
                     * @description A JPEG or PNG image.
                     */
                    file: string;
                };
            };
        };
        responses: {
            /** @description PlotPhoto: the photo kept (its type as found in the bytes). */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PlotPhotoDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The photo is larger than PHOTO_MAX_BYTES (8 MB by default). */
            413: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The file is not a JPEG or PNG image (checked from its content). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    PhotosController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                plotId: number;
                roundId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The photo was removed. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    ReportsController_get: {
        parameters: {
            query?: {
                alpha?: number;
                /** @description Mean separation method. */
                method?: "lsd" | "tukey" | "dunnett" | "bonferroni" | "holm";
                /** @description The assessment round to analyse; leave out for the latest round holding values of the measure in this scope. */
                roundId?: number;
                /** @description One site; leave out for all sites combined (a trial with one site: that site). */
                siteId?: number;
                /** @description With all sites combined: random tests treatment against site × treatment. */
                sitesAre?: "random" | "fixed";
            };
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description TrialReport. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TrialReportDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    RoundsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The assessment rounds in day order. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AssessmentRoundDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    RoundsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateRoundDto"];
            };
        };
        responses: {
            /** @description The round as saved. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AssessmentRoundDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong (e.g. the label is already used, or no measures); nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    RoundsController_remove: {
        parameters: {
            query?: {
                /** @description The trial code typed to confirm (any case); needed when the removal archives values or photos. */
                confirm?: string;
            };
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The round was archived, with its recorded values and photos. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Values or photos are recorded for it and the trial code was not typed as confirm (or was mistyped); nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    RoundsController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateRoundDto"];
            };
        };
        responses: {
            /** @description The round after the change. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AssessmentRoundDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or the trial is locked (problem body). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AssessmentRoundConflict"] | components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong; nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    RoundsController_removalImpact: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description RemovalImpact: values, notes and photos per site, a sentence, whether the trial code must be typed, and a refusal if any. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RemovalImpactDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    SitesController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The sites with their geometry, layout state and guardrail warnings. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SiteDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    SitesController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateSiteDto"];
            };
        };
        responses: {
            /** @description The site as saved. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SiteDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong (e.g. name or prefix used, geometry incomplete); nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    SitesController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The site was deleted. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked, or the site has observations. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    SitesController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateSiteDto"];
            };
        };
        responses: {
            /** @description The site after the change (its layout cleared when the blocks changed). */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SiteDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or the trial is locked, or a block change would touch a site with observations (problem body). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SiteConflict"] | components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong; nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    SitesController_randomize: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                siteId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["RandomizeSiteDto"];
            };
        };
        responses: {
            /** @description The site with its new layout (randomizedAt, seed, plot count). */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SiteDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked, has fewer than two treatments, or the site has observations. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    IntakeController_upload: {
        parameters: {
            query?: {
                /** @description true: keep values outside the usual range (the warnings) as typed. */
                acceptWarnings?: "true" | "false" | "1" | "0";
                /** @description true: say what the upload would do (new / changed / unchanged) and write nothing. */
                dryRun?: "true" | "false" | "1" | "0";
                /** @description JSON object from a column header to what it holds — plotLabel, block, treatment, notes, missingReason, a measure code — or null to ignore the column. Headers not named are matched automatically. */
                mapping?: string;
                /** @description The reason for every value written NA (missing) in a row whose missing reason cell is empty, or in a file without that column. */
                missingReason?: string;
                /** @description For a workbook: the sheet to read (its tab name). The first visible sheet when left out. */
                sheet?: string;
                /** @description A name of your choosing for this upload (8 to 64 letters, digits or dashes), to follow it at GET /api/trials/:trialId/intake-imports/:ticket while it runs. */
                ticket?: string;
            };
            header?: never;
            path: {
                roundId: number;
                siteId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /**
                     * @description Keep values outside the usual range as typed.
                     * @enum {string}
                     */
                    acceptWarnings?: "true" | "false";
                    /**
                     * Format: binary
                     * @description The CSV file (UTF-8; comma, semicolon or tab) or .xlsx workbook, as the site and round template. Up to INTAKE_MAX_BYTES (100 MB by default).
                     */
                    file: string;
                    /** @description JSON: column header → plotLabel, block, treatment, notes, missingReason, a measure code, notes:<measure code> (that measure’s own notes), or null. */
                    mapping?: string;
                    /** @description For a workbook: the sheet to read; the first visible one by default. */
                    sheet?: string;
                    /** @description Your name for this upload, to follow its progress at /api/trials/:trialId/intake-imports/:ticket. */
                    ticket?: string;
                };
            };
        };
        responses: {
            /** @description IntakeResult: what was written (or, with ?dryRun=true, what would be): new, changed and unchanged values. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["IntakeResultDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked, or the site is not randomized yet. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The file is larger than INTAKE_MAX_BYTES (100 MB by default, enough for a million rows of the template). */
            413: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description IntakeRefusal: nothing was written; errors lists every problem by row and column (or the warnings to accept). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["IntakeRefusalDto"] | components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    PlotsController_template: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                roundId: number;
                siteId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The site's plots of the round, one row each, with a column per measure to fill in. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/csv": string;
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The site is not randomized yet. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    PlotsController_templateWorkbook: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                roundId: number;
                siteId: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The same data sheet as a workbook: the plots' label, block and treatment locked (sheet protection, no password), each measure's cells checked as they are typed (its limits, NA, >cut-off). */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet": string;
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The site is not randomized yet. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TreatmentsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The treatments in their order. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TreatmentDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator, collaborator, reviewer. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TreatmentsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateTreatmentDto"];
            };
        };
        responses: {
            /** @description The treatment as saved. */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TreatmentDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked, is factorial, or a site has observations. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong (e.g. the code is already used); nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TreatmentsController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The treatment was deleted. */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The trial is locked, is factorial, or a site has observations of it. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    TreatmentsController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: number;
                /** @description The trial. */
                trialId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateTreatmentDto"];
            };
        };
        responses: {
            /** @description The treatment after the change. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TreatmentDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs one of these roles on the trial: investigator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No such trial, or you are not a member of it. */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The version is stale: VersionConflict with the current record, nothing written. Or the trial is locked (problem body). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TreatmentConflict"] | components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong; nothing written. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    UsersController_list: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Everyone, by name, with their last sign-in. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublicUserDto"][];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs an instance administrator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    UsersController_create: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateUserDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublicUserDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs an instance administrator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The e-mail is already in use. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong, or the password is too short or too common (a sentence). */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    UsersController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                userId: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateUserDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublicUserDto"];
                };
            };
            /** @description Administrators cannot deactivate themselves or drop their own rights. */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs an instance administrator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description The e-mail is already in use. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    UsersController_deactivate: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                userId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Deactivated: every session ended, sign-in refused. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublicUserDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs an instance administrator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    UsersController_reactivate: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                userId: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Reactivated with no valid session: old tokens stay dead. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublicUserDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Needs an instance administrator. */
            403: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
    UsersController_updateMine: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["MySettingsDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublicUserDto"];
                };
            };
            /** @description No valid token. */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description A field is wrong (named), e.g. an unknown locale. */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
        };
    };
}
