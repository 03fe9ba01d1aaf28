package org.protolyte.rules;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.UnaryOperator;

import org.protolyte.analysis.Analyzer;
import org.protolyte.analysis.BufferContribution;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.Drift;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.Loads;
import org.protolyte.analysis.TitratableAcidity;
import org.protolyte.analysis.Uncertainty;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * Hand-built analyses for testing one check kind on its own: a formulation is read and resolved (so pointers and
 * ingredients are real), and the figures a check judges are then set by the test, not computed, so a test states the
 * number on either side of a limit and no chemistry stands between it and the check.
 */
final class Analyses {

    static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(SCHEMAS);
    private static final Analyzer ANALYZER = new Analyzer(new Equilibrium(Davies.INSTANCE));
    private static final JsonMapper JSON = JsonMapper.builder().build();

    private Analyses() {
    }

    /** A formulation of 1 L with the given fields after "id" (each starting with a comma) and these components. */
    static String formulation(String fields, String... components) {
        return "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-FIX\", \"revision\": \"A\""
                + fields + ", \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + String.join(", ", components)
                + "]}";
    }

    static String component(String substance, String amount) {
        return "{\"substance\": \"" + substance + "\", \"amount\": \"" + amount + "\"}";
    }

    /** 10 mmol/L sodium chloride at a condition "use" of 25 °C (and any further fields). */
    static String saline(String fields) {
        return formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]" + fields,
                component("sodium chloride", "10 mmol/L"));
    }

    /** The engine's analysis of a formulation document. */
    static FormulationAnalysis analyse(String json) {
        var doc = new JsonReader().read("fixture.json", json.getBytes(StandardCharsets.UTF_8));
        return ANALYZER.analyze(new RecipeResolver(LIBRARY).resolve(new FormulationReader(SCHEMAS).read(doc)));
    }

    /** A rule of a kind with the given parameters (JSON object text). */
    static Rule rule(String check, String parameters) {
        return Rule.of("r-" + check, check, Severity.WARNING).withParameters((ObjectNode) JSON.readTree(parameters));
    }

    static List<Finding> run(CheckKind kind, FormulationAnalysis a, String parameters) {
        return kind.check(a, rule(kind.id(), parameters));
    }

    /** The analysis with every condition result changed. */
    static FormulationAnalysis conditions(FormulationAnalysis a, UnaryOperator<ConditionResult> change) {
        return with(a, a.conditions().stream().map(change).toList());
    }

    /** The analysis with the named condition's result changed. */
    static FormulationAnalysis condition(FormulationAnalysis a, String name, UnaryOperator<ConditionResult> change) {
        return with(a, a.conditions().stream().map(c -> c.condition().name().equals(name) ? change.apply(c) : c).toList());
    }

    static FormulationAnalysis with(FormulationAnalysis a, List<ConditionResult> conditions) {
        return new FormulationAnalysis(a.recipe(), a.solution(), conditions, a.titrants(), a.caveats(), a.assumptions(),
                a.targetSensitivities(), a.drifts(), a.titratableAcidity(), a.robustness(), a.working());
    }

    static FormulationAnalysis drifts(FormulationAnalysis a, Drift... drifts) {
        return new FormulationAnalysis(a.recipe(), a.solution(), a.conditions(), a.titrants(), a.caveats(),
                a.assumptions(), a.targetSensitivities(), List.of(drifts), a.titratableAcidity(), a.robustness(),
                a.working());
    }

    static FormulationAnalysis titratableAcidity(FormulationAnalysis a, double mmolPerLitre, OptionalDouble perDose) {
        return new FormulationAnalysis(a.recipe(), a.solution(), a.conditions(), a.titrants(), a.caveats(),
                a.assumptions(), a.targetSensitivities(), a.drifts(),
                Optional.of(new TitratableAcidity(mmolPerLitre, perDose)), a.robustness(), a.working());
    }

    // --- one condition's figures -------------------------------------------------------------------------------

    /** The state with pH, ionic strength (mol/kg) and osmolality (osmol/kg) replaced. */
    static ConditionResult state(ConditionResult c, double pH, double ionicStrength, double osmolality) {
        EquilibriumState s = c.state().orElseThrow();
        return state(c, new EquilibriumState(s.kelvin(), pH, ionicStrength, s.bufferCapacity(), s.pKw(),
                s.hydrogenMolality(), s.hydroxideMolality(), s.particleMolality(), osmolality, s.osmolalityModel(),
                s.species(), s.caveats(), s.componentBufferCapacity(), s.openComponents()));
    }

    static ConditionResult pH(ConditionResult c, double pH) {
        EquilibriumState s = c.state().orElseThrow();
        return state(c, pH, s.ionicStrength(), s.osmolality());
    }

    static ConditionResult ionicStrength(ConditionResult c, double molPerKg) {
        EquilibriumState s = c.state().orElseThrow();
        return state(c, s.pH(), molPerKg, s.osmolality());
    }

    static ConditionResult osmolality(ConditionResult c, double osmolPerKg) {
        EquilibriumState s = c.state().orElseThrow();
        return state(c, s.pH(), s.ionicStrength(), osmolPerKg);
    }

    private static ConditionResult state(ConditionResult c, EquilibriumState s) {
        return new ConditionResult(c.condition(), Optional.of(s), c.caveats(), c.bufferCapacityPerLitre(),
                c.osmolarity(), c.volumeLitres(), c.buffers(), c.pHInAir(), c.loads(), c.co2ForTarget(),
                c.uncertainty(), c.saturation());
    }

    /** Buffer capacity in mol/L per pH. */
    static ConditionResult bufferCapacity(ConditionResult c, double molPerLitre) {
        return new ConditionResult(c.condition(), c.state(), c.caveats(), molPerLitre, c.osmolarity(), c.volumeLitres(),
                c.buffers(), c.pHInAir(), c.loads(), c.co2ForTarget(), c.uncertainty(), c.saturation());
    }

    static ConditionResult buffers(ConditionResult c, BufferContribution... buffers) {
        return new ConditionResult(c.condition(), c.state(), c.caveats(), c.bufferCapacityPerLitre(), c.osmolarity(),
                c.volumeLitres(), List.of(buffers), c.pHInAir(), c.loads(), c.co2ForTarget(), c.uncertainty(),
                c.saturation());
    }

    static ConditionResult pHInAir(ConditionResult c, OptionalDouble pH) {
        return new ConditionResult(c.condition(), c.state(), c.caveats(), c.bufferCapacityPerLitre(), c.osmolarity(),
                c.volumeLitres(), c.buffers(), pH, c.loads(), c.co2ForTarget(), c.uncertainty(), c.saturation());
    }

    /** Strong acid and base (mol/L) it takes to leave the target. */
    static ConditionResult loads(ConditionResult c, OptionalDouble acid, OptionalDouble base) {
        return new ConditionResult(c.condition(), c.state(), c.caveats(), c.bufferCapacityPerLitre(), c.osmolarity(),
                c.volumeLitres(), c.buffers(), c.pHInAir(), Optional.of(new Loads(acid, base)), c.co2ForTarget(),
                c.uncertainty(), c.saturation());
    }

    static ConditionResult co2ForTarget(ConditionResult c, double pascal) {
        return new ConditionResult(c.condition(), c.state(), c.caveats(), c.bufferCapacityPerLitre(), c.osmolarity(),
                c.volumeLitres(), c.buffers(), c.pHInAir(), c.loads(), OptionalDouble.of(pascal), c.uncertainty(),
                c.saturation());
    }

    static ConditionResult uncertainty(ConditionResult c, double pH) {
        return c.withUncertainty(new Uncertainty(pH, 0, List.of()));
    }

    static ConditionResult withoutUncertainty(ConditionResult c) {
        return new ConditionResult(c.condition(), c.state(), c.caveats(), c.bufferCapacityPerLitre(), c.osmolarity(),
                c.volumeLitres(), c.buffers(), c.pHInAir(), c.loads(), c.co2ForTarget(), Optional.empty(),
                c.saturation());
    }

    /** The same result with an indeterminate caveat: its numbers must not be judged. */
    static ConditionResult indeterminate(ConditionResult c) {
        return c.withCaveat(Caveat.indeterminate("fixture", "set indeterminate by the test"));
    }

    /** A system carrying the buffering, with its nearest pKa and share. */
    static BufferContribution buffer(String system, double pKa, double share, boolean open) {
        return new BufferContribution(system, 0.01 * share, share, pKa, 0.01, open, false);
    }
}
