package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.chemistry.DrugSubstance;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.chemistry.SpeciesAmount;

/**
 * A drug substance of the formulation at its conditions: how much is dissolved against how much its solids allow at
 * the condition's pH and temperature, with the activity coefficients and counterions of the solution as solved
 * ({@link DrugSubstance}); and its pH–solubility profile in the medium of its first condition.
 */
public record DrugSolubility(DrugSubstance drug, List<AtCondition> conditions, List<Point> profile) {

    /** One point of the pH–solubility profile: mol per litre of solution that the least soluble solid allows. */
    public record Point(double pH, double solubility, String limiting) {
    }

    /** The profile's pH values: 1 to 13 in steps of 0.5. */
    static final int PROFILE_POINTS = 25;

    /**
     * One condition (with a pH).
     *
     * @param dissolved      mol per litre of solution, every form of the drug
     * @param solubility     mol per litre that the least soluble solid allows at the pH
     * @param limiting       that solid
     * @param log10Fraction  log10(dissolved / solubility): above 0 the solid can precipitate
     * @param uncertainty    standard uncertainty of log10Fraction
     * @param window         the pH range in which the dissolved amount stays dissolved at this temperature
     * @param pHMax          each salt's pHmax here, where its counterion is present
     * @param inRange        every solid's constant is known at this temperature (not extrapolated)
     */
    public record AtCondition(String condition, double kelvin, double pH, double dissolved, double solubility,
                              SolidPhase limiting, double log10Fraction, double uncertainty,
                              Optional<DrugSubstance.Window> window, Map<String, Double> pHMax, boolean inRange) {
        public AtCondition {
            pHMax = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(pHMax));
        }

        /** dissolved / solubility. */
        public double fraction() {
            return Math.pow(10, log10Fraction);
        }
    }

    public DrugSolubility {
        conditions = List.copyOf(conditions);
        profile = List.copyOf(profile);
    }

    /** Each drug whose forms the solution holds, at every determinate condition. */
    static List<DrugSolubility> of(List<DrugSubstance> drugs, List<ConditionResult> results, double waterKg) {
        List<DrugSolubility> out = new ArrayList<>();
        for (DrugSubstance d : drugs) {
            List<AtCondition> at = new ArrayList<>();
            List<Point> profile = new ArrayList<>();
            boolean present = false;
            for (ConditionResult r : results) {
                if (!r.determinate()) {
                    continue;
                }
                EquilibriumState s = r.state().orElseThrow();
                double m = dissolved(d, s);
                if (!(m > 0)) {
                    continue;
                }
                if (!present) {
                    profile = profile(d, s, waterKg / r.volumeLitres());
                }
                present = true;
                double uPH = r.uncertainty().map(Uncertainty::pH).orElse(Double.NaN);
                at.add(at(d, r.condition().name(), s, m, waterKg / r.volumeLitres(), uPH));
            }
            if (present) {
                out.add(new DrugSolubility(d, at, profile));
            }
        }
        return out;
    }

    /**
     * The pH–solubility profile in the medium of a solved state (its temperature, activity coefficients and
     * counterions held): the first condition's, in the report.
     */
    static List<Point> profile(DrugSubstance d, EquilibriumState s, double perLitre) {
        DrugSubstance.Medium m = DrugSubstance.Medium.of(s);
        List<Point> out = new ArrayList<>();
        for (int i = 0; i < PROFILE_POINTS; i++) {
            double pH = 1 + 0.5 * i;
            DrugSubstance.Limit l = d.solubility(pH, m);
            out.add(new Point(pH, Math.pow(10, l.log10Molality()) * perLitre, l.solid().name()));
        }
        return out;
    }

    /** mol/kg of the drug's forms in a solved state. */
    static double dissolved(DrugSubstance d, EquilibriumState s) {
        double m = 0;
        for (SpeciesAmount x : s.species()) {
            for (var f : d.system().forms()) {
                if (x.species().name().equals(f.name())) {
                    m += x.molality();
                }
            }
        }
        return m;
    }

    /**
     * The drug at one solved state; {@code perLitre} kg of water per litre of solution; a pH uncertainty that is not
     * known (NaN) counts as one pH unit, never as none.
     */
    static AtCondition at(DrugSubstance d, String condition, EquilibriumState s, double molality, double perLitre,
                          double pHUncertainty) {
        DrugSubstance.Medium medium = DrugSubstance.Medium.of(s);
        DrugSubstance.Limit limit = d.solubility(s.pH(), medium);
        double uPH = Double.isFinite(pHUncertainty) ? pHUncertainty : 1.0;
        Map<String, Double> pHMax = new LinkedHashMap<>();
        for (SolidPhase salt : d.salts()) {
            OptionalDouble x = d.pHMax(salt, medium);
            x.ifPresent(v -> pHMax.put(salt.name(), v));
        }
        boolean inRange = d.solids().stream().allMatch(p -> p.solubility().validity().contains(s.kelvin()));
        return new AtCondition(condition, s.kelvin(), s.pH(), molality * perLitre,
                Math.pow(10, limit.log10Molality()) * perLitre, limit.solid(),
                Math.log10(molality) - limit.log10Molality(),
                d.log10Uncertainty(limit.solid(), s.pH(), uPH, medium), d.window(molality, s.pH(), medium), pHMax,
                inRange);
    }
}
