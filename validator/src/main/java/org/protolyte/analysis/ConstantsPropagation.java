package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.List;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.Species;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/** The pH's uncertainty from the constants: see {@link Uncertainty} for what it covers. */
final class ConstantsPropagation {

    /** pH changes smaller than this are not resolved by the solver. */
    static final double PH_RESOLUTION = 1e-9;

    private final Equilibrium equilibrium;

    ConstantsPropagation(Equilibrium equilibrium) {
        this.equilibrium = equilibrium;
    }

    /**
     * Linear propagation of the constants' standard uncertainties: each pKa used, each ΔH° that has an uncertainty,
     * each complex's log K, and pKw moved by its uncertainty, the q.s. and every condition solved again, the changes added in quadrature
     * with the covariance of a step's pKa and ΔH° (u² = Σ c_i² + 2ρ c_pKa c_ΔH; they come from one fit).
     */
    List<ConditionResult> apply(Recipe recipe, Solution solution, List<ConditionResult> results) {
        record Perturbation(String name, double u, Equilibrium equilibrium, int pair, double correlation) {
        }
        List<Perturbation> perturbations = new ArrayList<>();
        boolean anyCo2 = recipe.formulation().conditions().stream().anyMatch(c -> c.co2Pascal().isPresent());
        List<AcidBaseSystem> systems = new ArrayList<>(recipe.library().systems());
        systems.sort(java.util.Comparator.comparing(AcidBaseSystem::name));
        for (AcidBaseSystem sys : systems) {
            boolean used = solution.totals().getOrDefault(sys.basis(), 0.0) > 0 || anyCo2 && sys.name().equals(Analyzer.CARBONATE);
            for (int k = 0; used && k < sys.steps().size(); k++) {
                DissociationStep step = sys.steps().get(k);
                String name = sys.name() + (sys.steps().size() > 1 ? " pKa" + (k + 1) : " pKa");
                int pair = perturbations.size();
                if (step.uncertainty() > 0) {
                    perturbations.add(new Perturbation(name, step.uncertainty(),
                            equilibrium.withPKaShift(sys, k, step.uncertainty()), -1, 0));
                }
                if (step.deltaHUncertainty() > 0) {
                    boolean paired = step.uncertainty() > 0 && step.correlation() != 0;
                    perturbations.add(new Perturbation(name.replace("pKa", "ΔH°"), step.deltaHUncertainty() / 1000,
                            equilibrium.withDeltaHShift(sys, k, step.deltaHUncertainty()), paired ? pair : -1,
                            step.correlation()));
                }
            }
        }
        for (Species complex : solution.species()) {       // complexes, ion pairs and esters the recipe forms
            if (complex.isComplex() && complex.formation().uncertainty() > 0) {
                perturbations.add(new Perturbation(complex.name() + " log K", complex.formation().uncertainty(),
                        equilibrium.withLogKShift(complex, complex.formation().uncertainty()), -1, 0));
            }
        }
        perturbations.add(new Perturbation("pKw", Equilibrium.PKW_UNCERTAINTY,
                equilibrium.withPKwShift(Equilibrium.PKW_UNCERTAINTY), -1, 0));
        int n = results.size();
        double[] pH2 = new double[n];
        double[] beta2 = new double[n];
        double[][] dpHs = new double[perturbations.size()][n];
        double[][] dBetas = new double[perturbations.size()][n];
        List<List<Uncertainty.Contribution>> parts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            parts.add(new ArrayList<>());
        }
        boolean[] failed = new boolean[n];
        for (int q = 0; q < perturbations.size(); q++) {
            Perturbation p = perturbations.get(q);
            double[][] moved = new Analyzer(p.equilibrium()).core(recipe);
            for (int i = 0; i < n; i++) {
                ConditionResult r = results.get(i);
                if (!r.determinate() || moved == null || Double.isNaN(moved[0][i])) {
                    failed[i] = true;
                    continue;
                }
                // below the solver's pH resolution (Equilibrium settles to 1e-9) a change is rounding, which varies
                // with how the JVM compiled the maths: none, so that a report is the same from one run to the next
                double raw = moved[0][i] - r.state().orElseThrow().pH();
                double dpH = Math.abs(raw) < PH_RESOLUTION ? 0 : raw;
                double dBeta = moved[1][i] - r.bufferCapacityPerLitre();
                dpHs[q][i] = dpH;
                dBetas[q][i] = dBeta;
                pH2[i] += dpH * dpH;
                beta2[i] += dBeta * dBeta;
                if (p.pair() >= 0) {        // the covariance term with the same step's pKa
                    pH2[i] += 2 * p.correlation() * dpH * dpHs[p.pair()][i];
                    beta2[i] += 2 * p.correlation() * dBeta * dBetas[p.pair()][i];
                }
                parts.get(i).add(new Uncertainty.Contribution(p.name(), p.u(), dpH));
            }
        }
        List<ConditionResult> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (failed[i]) {
                out.add(results.get(i).determinate() ? results.get(i).withCaveat(Caveat.warning("uncertainty-not-computed",
                        "the uncertainty from the constants could not be computed here: the pH is shown without it"))
                        : results.get(i));
                continue;
            }
            List<Uncertainty.Contribution> c = new ArrayList<>(parts.get(i));
            c.sort(java.util.Comparator.comparingDouble((Uncertainty.Contribution x) -> -Math.abs(x.pHChange())));
            out.add(results.get(i).withUncertainty(new Uncertainty(Math.sqrt(Math.max(0, pH2[i])),
                    Math.sqrt(Math.max(0, beta2[i])), c)));
        }
        return out;
    }
}
