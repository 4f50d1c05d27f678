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
        post: operations["AuthController_login"];
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
         * @description Designs: crd (treatment), rcbd (block, treatment), factorial-rcbd (block, A, B, A:B), multisite-rcbd (site, block:site, treatment, site:treatment). Sums of squares are sequential in that order. With sites random (the default) treatment is tested against site:treatment and site against block:site.
         */
        post: operations["StatsController_anova"];
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
        /** Save this analysis: the choices, the SHA-256 of the data used, the engine version and the full Findings, frozen */
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
        get: operations["AnalysesController_comments"];
        put?: never;
        post: operations["AnalysesController_comment"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/trials/{trialId}/analyses/{analysisId}/sign-off": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AnalysesController_signOff"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
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
         * The analysis of one measure and round, at one site or all sites combined
         * @description The same body as POST /api/stats/anova on the stored decimal text (design from the trial; several sites combined: multisite-rcbd), plus `context`: the observations in the order given to the engine (residual index), censoring, missing values, % of control, the rank test (Friedman for blocked designs, blocks = site × block when sites are combined; Kruskal–Wallis otherwise), the not-drained curve for a time with a cut-off, the means over time and the data hash.
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
        /** Everything the printable report needs: protocol, sites, per measure the ANOVA and means with letters (latest round with data, all sites combined), cautions and a plain paragraph */
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
            /** @description A new password (at least 10 characters) for a new account, or the existing account’s password. Not needed with the bearer token of the invited person. */
            password?: string;
        };
        ActivationCheckDto: {
            /** @description Each failed check in words, e.g. "Site Millbrook is not randomized yet." */
            problems: string[];
            ready: boolean;
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
        AnalysisDesign: "crd" | "rcbd" | "factorial-rcbd" | "multisite-rcbd";
        AnalysisSnapshotDto: {
            choices: components["schemas"]["FindingsChoicesDto"];
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
            result: components["schemas"]["FindingsDto"];
            roundLabel: string;
            scopeLabel: string;
            /** Format: date-time */
            signedOffAt: string | null;
            signedOffBy: string | null;
            signedOffById: number | null;
            title: string;
            trialId: number;
        };
        AnalysisSnapshotSummaryDto: {
            choices: components["schemas"]["FindingsChoicesDto"];
            commentCount: number;
            /** Format: date-time */
            createdAt: string;
            createdBy: string | null;
            createdById: number | null;
            dataHash: string;
            engineVersion: string;
            id: number;
            measureName: string;
            roundLabel: string;
            scopeLabel: string;
            /** Format: date-time */
            signedOffAt: string | null;
            signedOffBy: string | null;
            signedOffById: number | null;
            title: string;
            trialId: number;
        };
        /** @enum {string} */
        AnalysisTransform: "none" | "log" | "sqrt" | "arcsine-sqrt";
        AnovaAnswerDto: {
            anova: components["schemas"]["AnovaTableRowDto"][];
            comparisons: components["schemas"]["ComparisonsByMethodDto"];
            diagnostics: components["schemas"]["DiagnosticsDto"];
            /** @description Factorial only: LS means of each factor's levels, by factor name. */
            factorMeans?: {
                [key: string]: components["schemas"]["LsMeanDto"][];
            };
            /** @description Per method, treatment → compact letters. */
            letters: components["schemas"]["LettersByMethodDto"];
            means: components["schemas"]["LsMeanDto"][];
            summary: components["schemas"]["AnovaSummaryDto"];
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
            /** @enum {string} */
            design: "crd" | "rcbd" | "factorial-rcbd" | "multisite-rcbd";
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
            df: number;
            f: number | null;
            /** @description Null where the term is not tested. */
            ms: number | null;
            p: number | null;
            ss: number;
            /** @description 'block', 'treatment', 'site', 'block:site', 'site:treatment', factor names and 'A:B', 'error', 'total'. */
            term: string;
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
        };
        BartlettDto: {
            p: number;
            statistic: number;
        };
        BrownForsytheDto: {
            f: number;
            p: number;
        };
        CensoredSummaryDto: {
            count: number;
            cutoff: number | null;
        };
        ComparisonsByMethodDto: {
            bonferroni?: components["schemas"]["MethodComparisonSetDto"];
            dunnett?: components["schemas"]["MethodComparisonSetDto"];
            holm?: components["schemas"]["MethodComparisonSetDto"];
            lsd?: components["schemas"]["MethodComparisonSetDto"];
            tukey?: components["schemas"]["MethodComparisonSetDto"];
        };
        CreateAnalysisDto: {
            /** @default 0.05 */
            alpha?: number;
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
            /** @description One site; leave out for all sites combined. */
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
        CreateCommentDto: {
            /** @example The gypsum plots at Quarry Hill drained oddly fast; worth a look at the plot notes. */
            body: string;
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
            /** @default true */
            higherIsBetter?: boolean;
            /** @enum {string} */
            kind: "continuous" | "count" | "score" | "time-with-cutoff";
            /** @example drain time */
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
            design?: "crd" | "rcbd" | "factorial-rcbd";
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
            /** @example a long passphrase */
            password: string;
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
        FactorDto: {
            levels: components["schemas"]["FactorLevelDto"][];
            /** @example Gypsum */
            name: string;
        };
        FactorLevelDto: {
            /**
             * @description 1 to 6 letters or digits, unique within the factor.
             * @example G1
             */
            code: string;
            /** @example Gypsum 40 lb/1000 ft² */
            name: string;
        };
        FactorsDto: {
            /** @description Exactly two factors; the treatments become every combination of their levels. */
            factors: components["schemas"]["FactorDto"][];
        };
        FactorsReplacedDto: {
            factors: components["schemas"]["TrialFactorDto"][];
            treatments: components["schemas"]["TreatmentDto"][];
        };
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
            /** @description Time-with-cutoff measures only. */
            notDrained?: components["schemas"]["NotDrainedCurveDto"][];
            notices: string[];
            /** @description In the order given to the engine (residual index = position). */
            observations: components["schemas"]["FindingsObservationRowDto"][];
            percentOfControl: components["schemas"]["PercentOfControlDto"][];
            rankTest: components["schemas"]["FindingsRankTestDto"];
            round: components["schemas"]["RoundRefDto"];
            scope: components["schemas"]["FindingsScopeDto"];
            trialCode: string;
            trialId: number;
        };
        FindingsDto: {
            anova: components["schemas"]["AnovaTableRowDto"][];
            comparisons: components["schemas"]["ComparisonsByMethodDto"];
            context: components["schemas"]["FindingsContextDto"];
            diagnostics: components["schemas"]["DiagnosticsDto"];
            /** @description Factorial only: LS means of each factor's levels, by factor name. */
            factorMeans?: {
                [key: string]: components["schemas"]["LsMeanDto"][];
            };
            /** @description Per method, treatment → compact letters. */
            letters: components["schemas"]["LettersByMethodDto"];
            means: components["schemas"]["LsMeanDto"][];
            summary: components["schemas"]["AnovaSummaryDto"];
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
        HealthReportDto: {
            /** @enum {string} */
            database: "up" | "down";
            /** @description What is down, in words. */
            message?: string;
            /** @enum {string} */
            status: "ok" | "unavailable";
        };
        IntakeChangeDto: {
            after: string | null;
            before: string | null;
            /** @enum {string} */
            kind: "new" | "changed" | "unchanged";
            measureCode: string;
            plotLabel: string;
        };
        IntakeProblemDto: {
            /** @description The column header. */
            column: string | null;
            message: string;
            /** @description As a spreadsheet numbers it: the header is row 1, the first data row is row 2. */
            row: number | null;
        };
        IntakeRefusalDto: {
            error: string;
            errors: components["schemas"]["IntakeProblemDto"][];
            message: string;
            /** @enum {number} */
            statusCode: 422;
        };
        IntakeResultDto: {
            /** @description Per value: what the upload would do (dry run) or did. */
            changes: components["schemas"]["IntakeChangeDto"][];
            created: number;
            dryRun: boolean;
            /** @description True when the file is byte-identical to the last committed upload for this site and round. */
            identicalToPrevious: boolean;
            message: string;
            unchanged: number;
            updated: number;
            /** @description Values outside the plausible range, and similar: accepted only with acceptWarnings=true. */
            warnings: components["schemas"]["IntakeProblemDto"][];
        };
        InvitationAcceptResponseDto: {
            accessToken: string;
            /** @description Seconds until the token expires. */
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
        LoginDto: {
            /** @example investigator@example.org */
            email: string;
            /** @example friable-demo */
            password: string;
        };
        LoginResponseDto: {
            accessToken: string;
            /** @description Seconds until the token expires. */
            expiresIn: number;
            /** @enum {string} */
            tokenType: "Bearer";
            user: components["schemas"]["PublicUserDto"];
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
        };
        /** @enum {string} */
        MeasureKind: "continuous" | "count" | "score" | "time-with-cutoff";
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
        ObservationConflictDto: {
            /** @description The value as it is stored now, with its version. */
            current: components["schemas"]["RecordedObservationDto"];
            error: string;
            message: string;
            /** @enum {number} */
            statusCode: 409;
        };
        ObservationDto: {
            /**
             * @description Block label, nested within its site.
             * @example 1
             */
            block?: string;
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
             * @description A JSON number, or decimal text (analysed exactly).
             * @example 12.3
             */
            value: number | string;
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
            treatmentCode: string;
            treatmentId: number;
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
            id: number;
            isActive: boolean;
            isAdmin: boolean;
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
        ReportMeanDto: {
            /** @description With a transform: the mean back on the original scale. */
            backTransformedMean?: number;
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
            rankTest: components["schemas"]["FindingsRankTestDto"] | null;
            /** @description Latest round with data for the measure; null when it has none yet. */
            round: components["schemas"]["RoundRefDto"] | null;
            /** @description All sites combined. */
            scopeLabel: string;
            summary: components["schemas"]["AnovaSummaryDto"] | null;
            /** @description Why there is no analysis (no data yet, or the engine's sentence). */
            unavailable: string | null;
            /** @description Engine warnings and notices of this measure. */
            warnings: string[];
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
        RoundRefDto: {
            dayOffset: number;
            id: number;
            label: string;
        };
        /** @enum {string} */
        SeparationMethod: "lsd" | "tukey" | "dunnett" | "bonferroni" | "holm";
        ShapiroWilkDto: {
            p: number;
            w: number;
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
            /** @description Guardrail sentences: fewer than 4 blocks, error df below 12, one treatment. */
            warnings: string[];
            widthM: number | null;
        };
        SiteTotalDto: {
            grams: number | null;
            litres: number | null;
        };
        SnapshotCommentDto: {
            analysisId: number;
            authorId: number | null;
            authorName: string | null;
            body: string;
            /** Format: date-time */
            createdAt: string;
            id: number;
        };
        TreatmentDto: {
            code: string;
            description: string | null;
            /** @description For factorial trials: the level of each factor. */
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
        };
        /** @enum {string} */
        TrialDesign: "crd" | "rcbd" | "factorial-rcbd";
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
        };
        TrialFactorDto: {
            id: number;
            levels: components["schemas"]["TrialFactorLevelDto"][];
            name: string;
            /**
             * @description 1 = factor A, 2 = factor B.
             * @enum {number}
             */
            position: 1 | 2;
        };
        TrialFactorLevelDto: {
            code: string;
            id: number;
            name: string;
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
            /** @default true */
            higherIsBetter?: boolean;
            /** @enum {string} */
            kind?: "continuous" | "count" | "score" | "time-with-cutoff";
            /** @example drain time */
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
        };
        UpdateTrialDto: {
            /**
             * @default rcbd
             * @enum {string}
             */
            design?: "crd" | "rcbd" | "factorial-rcbd";
            /** @description Why the trial has no untreated control (instead of one). */
            noControlReason?: string | null;
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
            /**
             * @description 'active' only when every activation check passes (422 lists the problems).
             * @enum {string}
             */
            status?: "draft" | "active" | "locked" | "archived";
            /** @example Gypsum and compost on heavy clay */
            title?: string;
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
            /** @description A bearer token and the signed-in person. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["LoginResponseDto"];
                };
            };
            /** @description Wrong e-mail or password (the same answer for both). */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Too many failed attempts from this address within the window. */
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
    AuthController_me: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The signed-in person. */
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
            /** @description A name and a password of at least 10 characters are needed for a new account. */
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
            /** @description The trial is locked, or the status change is not allowed. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
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
            /** @description AnalysisSnapshotSummary[], newest first (without the result). */
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
    AnalysesController_comments: {
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
            /** @description SnapshotComment[], oldest first. */
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
    AnalysesController_comment: {
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
                "application/json": components["schemas"]["CreateCommentDto"];
            };
        };
        responses: {
            /** @description SnapshotComment; recorded in the activity log. */
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
        requestBody?: never;
        responses: {
            /** @description AnalysisSnapshot with signedOffAt and signedOffBy; recorded in the activity log. */
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
            /** @description The trial is not locked, or the analysis is already signed off (a sentence). */
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
            /** @description The trial is locked, is not factorial, or a site has observations. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
                };
            };
            /** @description Not exactly two factors, a factor with fewer than two levels, or repeated level codes. */
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
                /** @description Compute Fisher’s LSD even when the treatment F test is not significant. */
                forceLsd?: boolean;
                /** @description The measure to analyse. */
                measureId: number;
                /** @description Mean separation method. */
                method?: "lsd" | "tukey" | "dunnett" | "bonferroni" | "holm";
                /** @description The assessment round to analyse; leave out for the latest round holding values of the measure in this scope. */
                roundId?: number;
                /** @description One site; leave out for all sites combined. */
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
            /** @description Findings: AnovaAnswer & {context}. */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FindingsDto"];
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
            /** @description The measure was deleted. */
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
            /** @description The trial is locked, a site has observations of it, or it is the only measure of a round. */
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
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
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
            /** @description The trial is locked, or the cell already has a value (ObservationConflict with the current value). */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ObservationConflictDto"] | components["schemas"]["ProblemDto"];
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
            /** @description The trial is locked, or the version is stale: ObservationConflict with the current value; nothing was written. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ObservationConflictDto"] | components["schemas"]["ProblemDto"];
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
            /** @description The image (image/jpeg or image/png). */
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
            /** @description The round was deleted. */
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
            /** @description The trial is locked, or a site has observations. */
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
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
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
            /** @description The trial is locked, or a block change would touch a site with observations. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
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
                     * @description The CSV file (UTF-8; comma, semicolon or tab), as the site and round template.
                     */
                    file: string;
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
            /** @description The file is larger than INTAKE_MAX_BYTES (10 MB by default). */
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
            /** @description The trial is locked. */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ProblemDto"];
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
            /** @description Every account. */
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
            /** @description The new account. */
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
            /** @description The account, now inactive: its sessions end at once. */
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
            /** @description The account, active again. */
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
}
