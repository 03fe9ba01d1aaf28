package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.List;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/** The pH's uncertainty from the constants: see {@link Uncertainty} for what it covers. */
final class ConstantsPropagation {

    private final Equilibrium equilibrium;

    ConstantsPropagation(Equilibrium equilibrium) {
        this.equilibrium = equilibrium;
    }

    /**
     * Linear propagation of the constants' standard uncertainties: each pKa used (and pKw) moved by its
     * uncertainty, the q.s. and every condition solved again, the changes added in quadrature.
     */
    List<ConditionResult> apply(Recipe recipe, Solution solution, List<ConditionResult> results) {
        record Perturbation(String name, double u, Equilibrium equilibrium) {
        }
        List<Perturbation> perturbations = new ArrayList<>();
        boolean anyCo2 = recipe.formulation().conditions().stream().anyMatch(c -> c.co2Pascal().isPresent());
        for (AcidBaseSystem sys : recipe.library().systems()) {
            boolean used = solution.totals().getOrDefault(sys.basis(), 0.0) > 0 || anyCo2 && sys.name().equals(Analyzer.CARBONATE);
            for (int k = 0; used && k < sys.steps().size(); k++) {
                double u = sys.steps().get(k).uncertainty();
                if (u > 0) {
                    String name = sys.name() + (sys.steps().size() > 1 ? " pKa" + (k + 1) : " pKa");
                    perturbations.add(new Perturbation(name, u, equilibrium.withPKaShift(sys, k, u)));
                }
            }
        }
        perturbations.add(new Perturbation("pKw", Equilibrium.PKW_UNCERTAINTY,
                equilibrium.withPKwShift(Equilibrium.PKW_UNCERTAINTY)));
        int n = results.size();
        double[] pH2 = new double[n];
        double[] beta2 = new double[n];
        List<List<Uncertainty.Contribution>> parts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            parts.add(new ArrayList<>());
        }
        boolean[] failed = new boolean[n];
        for (Perturbation p : perturbations) {
            double[][] moved = new Analyzer(p.equilibrium()).core(recipe);
            for (int i = 0; i < n; i++) {
                ConditionResult r = results.get(i);
                if (!r.determinate() || moved == null || Double.isNaN(moved[0][i])) {
                    failed[i] = true;
                    continue;
                }
                double dpH = moved[0][i] - r.state().orElseThrow().pH();
                double dBeta = moved[1][i] - r.bufferCapacityPerLitre();
                pH2[i] += dpH * dpH;
                beta2[i] += dBeta * dBeta;
                parts.get(i).add(new Uncertainty.Contribution(p.name(), p.u(), dpH));
            }
        }
        List<ConditionResult> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (failed[i]) {
                out.add(results.get(i));
                continue;
            }
            List<Uncertainty.Contribution> c = new ArrayList<>(parts.get(i));
            c.sort(java.util.Comparator.comparingDouble((Uncertainty.Contribution x) -> -Math.abs(x.pHChange())));
            out.add(results.get(i).withUncertainty(new Uncertainty(Math.sqrt(pH2[i]), Math.sqrt(beta2[i]), c)));
        }
        return out;
    }
}
