package org.protolyte.analysis;

import org.protolyte.document.Formulation;

import java.util.List;
import java.util.Optional;

import org.protolyte.chemistry.Caveat;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/**
 * Everything computed for one formulation: per condition, the q.s. titrants, what was assumed, and the
 * sensitivity of the pH at the target's temperature to each component (largest first), and a robustness
 * study and the points behind the report's plots where they were asked for; each protein the formulation defines,
 * with its pI, and its net charge, share of β and pH shift against the buffer alone at every condition (the short
 * constructor leaves the shifts empty); and each drug substance's dissolved amount against its solubility.
 */
public record FormulationAnalysis(Recipe recipe, Solution solution, List<ConditionResult> conditions,
                                  List<TitrantResult> titrants, List<Caveat> caveats, List<String> assumptions,
                                  List<Sensitivity> targetSensitivities, List<Drift> drifts,
                                  Optional<TitratableAcidity> titratableAcidity,
                                  Optional<Robustness.Result> robustness, Optional<WorkingSolution> working,
                                  Optional<Curves> curves, List<ProteinCharge> proteins, List<DrugSolubility> drugs,
                                  List<Admixed> admixtures) {

    /**
     * The product mixed into a receiving fluid: the mixture, its equilibrium at the fluid's temperature and CO2 (with
     * the uncertainty from the product's constants), and each drug substance's solubility in it.
     */
    public record Admixed(Formulation.Admixture admixture, org.protolyte.substance.Fluid fluid, Solution mixture,
                          ConditionResult result, List<DrugSolubility> drugs) {
        public Admixed {
            drugs = List.copyOf(drugs);
        }
    }

    public FormulationAnalysis(Recipe recipe, Solution solution, List<ConditionResult> conditions,
                               List<TitrantResult> titrants, List<Caveat> caveats, List<String> assumptions,
                               List<Sensitivity> targetSensitivities, List<Drift> drifts,
                               Optional<TitratableAcidity> titratableAcidity, Optional<Robustness.Result> robustness,
                               Optional<WorkingSolution> working) {
        this(recipe, solution, conditions, titrants, caveats, assumptions, targetSensitivities, drifts,
                titratableAcidity, robustness, working, Optional.empty(), ProteinCharge.of(recipe.library().proteins(),
                        conditions, p -> java.util.Collections.nCopies(conditions.size(), java.util.OptionalDouble.empty())),
                DrugSolubility.of(recipe.library().drugSubstances(), conditions, solution.waterKg()), List.of());
    }

    /** A concentrate's working solution: the dilution and every condition again (rules judge the document itself). */
    public record WorkingSolution(Formulation.Dilution dilution, Solution solution, List<ConditionResult> conditions) {
        public WorkingSolution {
            conditions = List.copyOf(conditions);
        }
    }

    /**
     * The pH change at condition i from the concentrate to its working solution (empty where either has no pH). With
     * no ion pairs as separate species (Pitzer's parameters hold them), its cause is the activity coefficients' change
     * with ionic strength, plus the water's and the weak acids' own dilution.
     */
    public java.util.OptionalDouble dilutionShift(int i) {
        if (working.isEmpty() || i >= conditions.size() || i >= working.get().conditions().size()) {
            return java.util.OptionalDouble.empty();
        }
        var c = conditions.get(i).state();
        var w = working.get().conditions().get(i).state();
        return c.isPresent() && w.isPresent() ? java.util.OptionalDouble.of(w.get().pH() - c.get().pH())
                : java.util.OptionalDouble.empty();
    }

    public FormulationAnalysis withRobustness(Robustness.Result r) {
        return new FormulationAnalysis(recipe, solution, conditions, titrants, caveats, assumptions, targetSensitivities,
                drifts, titratableAcidity, Optional.of(r), working, curves, proteins, drugs, admixtures);
    }

    public FormulationAnalysis withCurves(Curves c) {
        return new FormulationAnalysis(recipe, solution, conditions, titrants, caveats, assumptions, targetSensitivities,
                drifts, titratableAcidity, robustness, working, Optional.of(c), proteins, drugs, admixtures);
    }

    public FormulationAnalysis {
        drifts = List.copyOf(drifts);
        targetSensitivities = List.copyOf(targetSensitivities);
        conditions = List.copyOf(conditions);
        titrants = List.copyOf(titrants);
        caveats = List.copyOf(caveats);
        assumptions = List.copyOf(assumptions);
        proteins = List.copyOf(proteins);
        drugs = List.copyOf(drugs);
        admixtures = List.copyOf(admixtures);
    }
}
