package org.cupel.censored;

import java.util.ArrayList;
import java.util.List;

/**
 * Every censored-data summary of one sample side by side: Kaplan–Meier, ROS, maximum likelihood
 * (normal and lognormal), the substitution comparison, and the recommendation of which the report uses.
 *
 * @param sample the observations
 * @param kaplanMeier Kaplan–Meier fit
 * @param ros ROS fit
 * @param mleNormal censored normal MLE
 * @param mleLognormal censored lognormal MLE
 * @param substitution the four substitution rules, comparison only
 * @param recommendation which summary the report uses and why
 */
public record CensoredAnalysis(CensoredSample sample, KaplanMeier.Result kaplanMeier, Ros.Result ros,
                               CensoredMle.Result mleNormal, CensoredMle.Result mleLognormal,
                               List<CensoredSummary> substitution, Recommendation recommendation) {

    public CensoredAnalysis {
        substitution = List.copyOf(substitution);
    }

    public static CensoredAnalysis of(CensoredSample sample, CensoredSettings settings) {
        KaplanMeier.Result km = KaplanMeier.fit(sample, settings.kmOptions());
        Ros.Result ros = Ros.fit(sample, settings.bootstrapReplicates(), settings.bootstrapSeed(),
                settings.bootstrapMaxN());
        CensoredMle.Result normal = CensoredMle.fit(sample, CensoredMle.Distribution.NORMAL);
        CensoredMle.Result lognormal = CensoredMle.fit(sample, CensoredMle.Distribution.LOGNORMAL);
        Recommendation rec = Recommendation.choose(sample, km.summary(), ros.summary(), lognormal.summary(),
                normal.summary());
        return new CensoredAnalysis(sample, km, ros, normal, lognormal, Substitution.all(sample), rec);
    }

    /** KM, ROS, MLE normal, MLE lognormal, then the substitution rules. */
    public List<CensoredSummary> summaries() {
        List<CensoredSummary> all = new ArrayList<>();
        all.add(kaplanMeier.summary());
        all.add(ros.summary());
        all.add(mleNormal.summary());
        all.add(mleLognormal.summary());
        all.addAll(substitution);
        return all;
    }

    /** The summary the recommendation names, or null when none is recommended. */
    public CensoredSummary recommended() {
        for (CensoredSummary s : summaries()) {
            if (s.method().equals(recommendation.method())) {
                return s;
            }
        }
        return null;
    }
}
