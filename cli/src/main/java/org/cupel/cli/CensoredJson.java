package org.cupel.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.censored.BlankLimits;
import org.cupel.censored.CensoredAnalysis;
import org.cupel.censored.CensoredMle;
import org.cupel.censored.CensoredSample;
import org.cupel.censored.CensoredSummary;
import org.cupel.censored.Censoring;
import org.cupel.censored.Estimate;
import org.cupel.censored.Quantile;

/** The JSON shape of the censored commands (documented in docs/json-censored.md); numbers not estimated are null. */
final class CensoredJson {
    private CensoredJson() {
    }

    static Map<String, Object> analysis(String file, String column, String kmLowest, CensoredAnalysis a) {
        Map<String, Object> m = new LinkedHashMap<>();
        CensoredSample s = a.sample();
        m.put("file", file);
        m.put("column", column);
        m.put("n", s.size());
        m.put("missing", s.missingCount());
        m.put("belowDetection", s.count(Censoring.BELOW));
        m.put("aboveRange", s.count(Censoring.ABOVE));
        m.put("censoredFraction", s.censoredFraction());
        m.put("detectionLimits", s.distinctBelowLimits());
        m.put("upperLimits", s.distinctAboveLimits());
        m.put("kmLowestMass", kmLowest);
        List<Object> sums = new ArrayList<>();
        for (CensoredSummary x : a.summaries()) {
            sums.add(summary(x));
        }
        m.put("summaries", sums);
        m.put("ros", a.ros().summary().isApplicable()
                ? Map.of("intercept", a.ros().intercept(), "slope", a.ros().slope()) : null);
        m.put("mleNormal", mle(a.mleNormal()));
        m.put("mleLognormal", mle(a.mleLognormal()));
        Map<String, Object> rec = new LinkedHashMap<>();
        rec.put("method", a.recommendation().method());
        rec.put("reason", a.recommendation().reason());
        m.put("recommendation", rec);
        return m;
    }

    static Map<String, Object> blanks(String file, String column, BlankLimits b) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("file", file);
        m.put("column", column);
        m.put("n", b.n());
        m.put("detected", b.detected());
        m.put("belowDetection", b.below());
        m.put("aboveRange", b.above());
        m.put("missing", b.missing());
        m.put("spreadMethod", b.spreadMethod());
        m.put("mean", estimate(b.mean()));
        m.put("sd", estimate(b.sd()));
        List<Object> limits = new ArrayList<>();
        for (BlankLimits.LimitEstimate l : b.limits()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("name", l.name());
            e.put("value", number(l.value().value()));
            e.put("rule", l.rule());
            e.put("source", l.source());
            e.put("note", l.value().note());
            limits.add(e);
        }
        m.put("limits", limits);
        return m;
    }

    private static Map<String, Object> summary(CensoredSummary x) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("method", x.method());
        m.put("n", x.n());
        m.put("nCensored", x.nCensored());
        m.put("applicable", x.isApplicable());
        m.put("mean", estimate(x.mean()));
        m.put("sd", estimate(x.sd()));
        m.put("median", estimate(x.median()));
        List<Object> qs = new ArrayList<>();
        for (Quantile q : x.percentiles()) {
            Map<String, Object> e = estimate(q.estimate());
            e.put("probability", q.probability());
            qs.add(e);
        }
        m.put("percentiles", qs);
        m.put("notes", x.notes());
        return m;
    }

    private static Map<String, Object> mle(CensoredMle.Result r) {
        if (!r.summary().isApplicable()) {
            return null;
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("mu", r.mu());
        m.put("sigma", r.sigma());
        m.put("seMu", r.seMu());
        m.put("seLogSigma", r.seLogSigma());
        m.put("logLikelihood", r.logLikelihood());
        m.put("iterations", r.iterations());
        return m;
    }

    private static Map<String, Object> estimate(Estimate e) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("value", number(e.value()));
        m.put("standardError", number(e.standardError()));
        m.put("lower", number(e.lower()));
        m.put("upper", number(e.upper()));
        m.put("note", e.note());
        return m;
    }

    private static Double number(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
