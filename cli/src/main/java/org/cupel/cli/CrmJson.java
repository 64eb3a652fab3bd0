package org.cupel.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.control.crm.AnalyteReview;
import org.cupel.control.crm.BiasEstimate;
import org.cupel.control.crm.CrmException;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.LinearFit;
import org.cupel.control.crm.SeriesDrift;
import org.cupel.control.crm.SeriesReview;

/**
 * The {@code cupel crm --json} document (docs/json-crm.md): plain maps of the review's records, with
 * numbers that could not be estimated written as null (never NaN) beside a note saying why.
 */
final class CrmJson {
    private CrmJson() {
    }

    static Map<String, Object> of(String project, CrmReview r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("schema", "cupel-crm/1");
        m.put("project", project);
        m.put("limits", "certified value ± 2 SD (warning) and ± 3 SD (failure), SD = certificate between-lab SD");
        m.put("settings", r.settings());
        m.put("summary", Map.of("results", r.series().stream().mapToLong(SeriesReview::n).sum(),
                "failures", r.failures(), "warnings", r.warnings(), "swaps", r.swaps(),
                "exceptions", r.exceptions().size()));
        List<Object> series = new ArrayList<>();
        r.series().forEach(s -> series.add(series(s)));
        m.put("series", series);
        List<Object> analytes = new ArrayList<>();
        for (AnalyteReview a : r.analytes()) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("analyte", a.analyte());
            x.put("drift", drift(a.drift()));
            x.put("biasVsGrade", fit(a.biasVsGrade().fit()));
            analytes.add(x);
        }
        m.put("analytes", analytes);
        List<Object> ex = new ArrayList<>();
        for (CrmException e : r.exceptions()) {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("sampleId", e.sampleId());
            x.put("batch", e.batchId());
            x.put("crm", e.crm());
            x.put("analyte", e.analyte());
            x.put("reported", e.found());
            x.put("kind", e.rule());
            x.put("problem", e.problem());
            ex.add(x);
        }
        m.put("exceptions", ex);
        return m;
    }

    private static Map<String, Object> series(SeriesReview s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("crm", s.crm());
        m.put("analyte", s.analyte().name());
        m.put("unit", s.analyte().unit().symbol());
        m.put("certified", num(s.limits().certified()));
        m.put("sd", num(s.limits().sd()));
        // The decimals the catalog writes them with (1.236: 3), null when not known, and the limits as shown.
        m.put("certifiedDecimals", s.limits().valueDecimals() < 0 ? null : s.limits().valueDecimals());
        m.put("sdDecimals", s.limits().sdDecimals() < 0 ? null : s.limits().sdDecimals());
        m.put("certifiedText", s.limits().certifiedText());
        m.put("sdText", s.limits().sdText());
        m.put("n", s.n());
        m.put("failures", s.failures());
        m.put("warnings", s.warnings());
        m.put("swaps", s.swaps());
        m.put("bias", bias(s.bias()));
        Map<String, Object> pl = new LinkedHashMap<>();
        pl.put("available", s.projectLimits().available());
        pl.put("n", s.projectLimits().n());
        pl.put("mean", num(s.projectLimits().mean()));
        pl.put("sd", num(s.projectLimits().sd()));
        pl.put("note", s.projectLimits().note());
        m.put("projectLimits", pl);
        m.put("drift", drift(s.drift()));
        m.put("violations", s.findings());
        List<Object> results = new ArrayList<>();
        for (CrmResult x : s.results()) {
            Map<String, Object> r = new LinkedHashMap<>();
            r.put("sampleId", x.point().sampleId());
            r.put("batch", x.point().batchId());
            r.put("date", x.point().date() == null ? null : x.point().date().toString());
            r.put("position", x.point().position());
            r.put("value", x.point().value().display());
            r.put("z", num(x.z()));
            r.put("band", x.band());
            r.put("verdict", x.verdict());
            r.put("rules", x.rules());
            r.put("reason", x.reason());
            r.put("triggersReassay", x.triggersReassay());
            r.put("swapWith", x.swapWith().isEmpty() ? null : x.swapWith());
            r.put("runningMean", num(x.runningMean()));
            results.add(r);
        }
        m.put("results", results);
        return m;
    }

    private static Map<String, Object> bias(BiasEstimate b) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("n", b.n());
        m.put("mean", num(b.meanResult()));
        m.put("sdOfResults", num(b.sdResult()));
        m.put("meanBiasPct", num(b.meanBiasPct()));
        m.put("meanBiasCiPct", Double.isFinite(b.meanLowPct()) ? List.of(b.meanLowPct(), b.meanHighPct()) : null);
        m.put("medianBiasPct", num(b.median().median()));
        m.put("medianBiasCiPct", b.median().estimated() ? List.of(b.median().low(), b.median().high()) : null);
        m.put("medianCiCoverage", num(b.median().coverage()));
        m.put("certifiedInsideMeanCi", Double.isFinite(b.meanLowPct()) ? b.certifiedInsideMeanInterval() : null);
        m.put("certifiedInsideMedianCi", b.median().estimated() ? b.certifiedInsideMedianInterval() : null);
        m.put("confidence", b.confidence());
        m.put("note", b.note());
        return m;
    }

    private static Map<String, Object> drift(SeriesDrift d) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("timeAxis", d.timeAxis());
        m.put("trend", fit(d.trend()));
        m.put("ewmaFirstSignal", d.ewma().firstSignal() < 0 ? null : d.judgedIndex(d.ewma().firstSignal()) + 1);
        m.put("ewmaLambda", d.ewma().lambda());
        m.put("ewmaL", d.ewma().width());
        m.put("cusumFirstSignal", d.cusum().firstSignal() < 0 ? null : d.judgedIndex(d.cusum().firstSignal()) + 1);
        m.put("cusumK", d.cusum().k());
        m.put("cusumH", d.cusum().h());
        m.put("drifting", d.drifting());
        m.put("findings", d.findings());
        m.put("outliers", d.outliers().stream().map(o -> {
            Map<String, Object> x = new LinkedHashMap<>();
            x.put("result", o.index() + 1);
            x.put("sampleId", o.sampleId());
            x.put("batch", o.batchId());
            x.put("z", o.z());
            x.put("finding", o.finding());
            return x;
        }).toList());
        return m;
    }

    private static Map<String, Object> fit(LinearFit f) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("n", f.n());
        m.put("slope", num(f.slope()));
        m.put("slopeCi", f.estimated() ? List.of(f.slopeLow(), f.slopeHigh()) : null);
        m.put("intercept", num(f.intercept()));
        m.put("p", num(f.pValue()));
        m.put("rSquared", num(f.rSquared()));
        m.put("confidence", f.confidence());
        m.put("note", f.note());
        return m;
    }

    private static Double num(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
