package org.protolyte.rules;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.protolyte.batch.BatchAnalysis;

/**
 * When the batch as recorded misses a measurement, the usual mistakes consistent with every measurement: each
 * candidate's predictions fall within {@code pH} (default 0.1), {@code titrant} and {@code osmolality} (per cent,
 * defaults 10 and 3) of what was measured. Two or more observations rank the candidates by Σ(difference/limit)²; one
 * observation cannot, so they are listed unranked with the further measurement that would tell them apart. A
 * measurement misses as batch-ph-agrees and the other agreement rules judge it: a pH reading where the solution is
 * unbuffered is a note there, set by traces and CO2, and here it neither calls for a diagnosis nor judges a candidate.
 */
public final class BatchDiagnosis implements BatchCheckKind {

    @Override
    public String id() {
        return "batch-diagnosis";
    }

    @Override
    public String summary() {
        return "where prediction and measurement disagree, the usual mistakes that fit the measurements";
    }

    private record Fit(BatchAnalysis.Candidate candidate, double score) {
    }

    /** The pH readings' rule sets which of them are compared at all: the first batch-ph-agrees rule selected. */
    @Override
    public List<Finding> check(BatchAnalysis b, Rule rule, List<Rule> selection) {
        Rule pH = selection.stream().filter(r -> r.enabled() && r.check().equals("batch-ph-agrees")).findFirst()
                .orElse(Rule.of("batch-ph-agrees", "batch-ph-agrees", Severity.WARNING));
        return check(b, rule, pH);
    }

    @Override
    public List<Finding> check(BatchAnalysis b, Rule rule) {
        return check(b, rule, Rule.of("batch-ph-agrees", "batch-ph-agrees", Severity.WARNING));
    }

    /**
     * A reading disagrees where batch-ph-agrees (or the titrant, osmolality limit here) would say so; an unbuffered pH
     * reading, a note there, neither calls for a diagnosis nor judges a candidate, since traces and CO2 set it.
     */
    private List<Finding> check(BatchAnalysis b, Rule rule, Rule pHRule) {
        List<BatchAnalysis.Observation> obs = b.observations();
        java.util.function.Predicate<BatchAnalysis.Observation> compared = o -> !Double.isNaN(o.predicted())
                && !BatchMeasurementAgrees.unbuffered(o, pHRule);
        java.util.function.Predicate<BatchAnalysis.Observation> disagrees = o -> compared.test(o)
                && Math.abs(o.measured() - o.predicted()) > (o.kind() == BatchAnalysis.Observation.Kind.PH
                ? BatchMeasurementAgrees.pHLimit(o, limit(rule, o.kind(), o.predicted()), pHRule)
                : limit(rule, o.kind(), o.predicted()));
        if (b.candidates().isEmpty() || obs.stream().noneMatch(disagrees)) {
            return List.of();
        }
        List<Fit> fits = new ArrayList<>();
        List<String> uncomputed = new ArrayList<>();
        for (BatchAnalysis.Candidate c : b.candidates().subList(1, b.candidates().size())) {
            c.unpredicted().ifPresent(why -> uncomputed.add(uncomputed.isEmpty() ? c.cause() + " (" + why + ")"
                    : c.cause()));
            double score = 0;
            boolean fits_ = true;
            for (int i = 0; i < obs.size(); i++) {
                if (BatchMeasurementAgrees.unbuffered(obs.get(i), pHRule)) {
                    continue;
                }
                double p = c.predicted()[i];
                double lim = limit(rule, obs.get(i).kind(), obs.get(i).measured());
                if (Double.isNaN(p) || Math.abs(p - obs.get(i).measured()) > lim) {
                    fits_ = false;
                    break;
                }
                double z = (p - obs.get(i).measured()) / lim;
                score += z * z;
            }
            if (fits_) {
                fits.add(new Fit(c, score));
            }
        }
        long independent = obs.stream().filter(compared).count();
        StringBuilder m = new StringBuilder("measured ").append(list(obs, true, null))
                .append("; the additions as recorded give ").append(list(obs, false, b.candidates().get(0).predicted()));
        if (fits.isEmpty()) {
            m.append("; none of the usual mistakes (another form, ten times too much or too little, an addition left "
                    + "out, a titrant or stock at another strength) fits: check the meter's calibration and "
                    + "temperature, and the materials used");
        } else if (independent >= 2) {
            fits.sort(Comparator.comparingDouble(Fit::score));
            m.append("; consistent with, best fit first: ");
            for (int i = 0; i < fits.size(); i++) {
                m.append(i == 0 ? "" : "; ").append(i + 1).append(". ").append(describe(fits.get(i).candidate(), obs));
            }
        } else {
            m.append(fits.size() == 1 ? "; consistent with " : "; consistent with each of (one observation cannot rank "
                    + "them): ");
            for (int i = 0; i < fits.size(); i++) {
                m.append(i == 0 ? "" : "; ").append(describe(fits.get(i).candidate(), obs));
            }
            if (fits.size() > 1) {
                m.append(tellApart(rule, fits));
            }
        }
        if (!uncomputed.isEmpty()) {
            m.append(String.format(Locale.ROOT, "; %d of the usual mistakes could not be predicted and are not judged: ",
                    uncomputed.size())).append(String.join("; ", uncomputed));
        }
        BatchAnalysis.Observation first = obs.stream().filter(disagrees).findFirst().orElseThrow();
        return List.of(rule.finding(b.record().document(), first.pointer(), m.toString()));
    }

    private static double limit(Rule rule, BatchAnalysis.Observation.Kind kind, double value) {
        return switch (kind) {
            case PH -> rule.number("pH", 0.1);
            case TITRANT -> rule.number("titrant", 10) / 100 * Math.abs(value);
            case OSMOLALITY -> rule.number("osmolality", 3) / 100 * Math.abs(value);
        };
    }

    private static String list(List<BatchAnalysis.Observation> obs, boolean measured, double[] predicted) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < obs.size(); i++) {
            BatchAnalysis.Observation o = obs.get(i);
            double x = measured ? o.measured() : predicted[i];
            parts.add(measured ? o.label() + " " + o.kind().text(x) : o.kind().text(x));
        }
        return String.join(" and ", parts);
    }

    private static String describe(BatchAnalysis.Candidate c, List<BatchAnalysis.Observation> obs) {
        return c.cause() + " (gives " + list(obs, false, c.predicted()) + ")";
    }

    /** The further measurement whose predictions differ most between the candidates, relative to its limit. */
    private static String tellApart(Rule rule, List<Fit> fits) {
        int n = fits.get(0).candidate().further().size();
        int best = -1;
        double widest = 0;
        for (int k = 0; k < n; k++) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (Fit f : fits) {
                var x = f.candidate().further().get(k).predicted();
                if (x.isPresent()) {
                    lo = Math.min(lo, x.getAsDouble());
                    hi = Math.max(hi, x.getAsDouble());
                }
            }
            BatchAnalysis.Further first = fits.get(0).candidate().further().get(k);
            double spread = (hi - lo) / limit(rule, first.kind(), Math.max(Math.abs(hi), Math.abs(lo)));
            if (spread > widest) {   // equal or absent predictions give 0, −∞ or NaN: never wider
                widest = spread;
                best = k;
            }
        }
        if (best < 0 || widest <= 1) {
            return "; no further measurement in reach tells them apart";
        }
        List<String> values = new ArrayList<>();
        for (Fit f : fits) {
            var x = f.candidate().further().get(best).predicted();
            values.add(x.isPresent() ? f.candidate().further().get(best).kind().text(x.getAsDouble()) : "—");
        }
        return String.format(Locale.ROOT, "; the %s would tell them apart (%s, in the order above)",
                fits.get(0).candidate().further().get(best).label(), String.join(", ", values));
    }
}
