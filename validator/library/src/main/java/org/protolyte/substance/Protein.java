package org.protolyte.substance;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.RootFinder;
import org.protolyte.chemistry.Component;
import org.protolyte.document.Formulation;

/**
 * A protein or peptide a formulation defines: its titrating groups, counted from its chains (each residue D, E, H,
 * C, Y, K, R carries one; each chain a free N- and C-terminus unless blocked; a disulfide takes two cysteines) or
 * given, each kind one acid–base system bound to the macroion with its pKa set's step (independent groups, the null
 * model of protein titration; common practice), and the substance a recipe line then is.
 *
 * @param groups       titrating groups per molecule
 * @param molarMass    g/mol: stated, or from the sequence with the IUPAC atomic weights (residues as the library's amino
 *                     acid formulas less water, one water per chain, acetyl C2H2O, amide NH less O, 2 H per disulfide)
 * @param computedMass the mass from the sequence, empty where groups were given
 * @param systems      one bound system per kind of group present, named after the protein
 */
public record Protein(String name, Map<ProteinGroup, Integer> groups, double molarMass, OptionalDouble computedMass,
                      String pKaSet, Map<ProteinGroup, AcidBaseSystem> systems, Component solute, Substance substance) {

    /** The set a protein line gets without {@code pKaSet}: measured at a stated temperature and ionic strength. */
    public static final String DEFAULT_SET = "model peptides";

    /**
     * Partial specific volume of a protein, cm³/g, for the density model: "proteins > 30 kDa can be assumed to have a
     * partial specific volume of 0.708 mL/g" (Buxbaum, Biophysical Chemistry of Proteins, Springer 2011, ch. 25,
     * pp. 237–249, as quoted in the encyclopaedia article "Partial specific volume").
     */
    public static final double SPECIFIC_VOLUME = 0.708;

    /** The residue formulas: the 20 amino acids as the library has them. */
    private static final Map<Character, String> AMINO_ACIDS = Map.ofEntries(
            Map.entry('A', "L-alanine"), Map.entry('R', "L-arginine free base"), Map.entry('N', "L-asparagine anhydrous"),
            Map.entry('D', "L-aspartic acid"), Map.entry('C', "L-cysteine"), Map.entry('Q', "L-glutamine"),
            Map.entry('E', "L-glutamic acid"), Map.entry('G', "glycine"), Map.entry('H', "L-histidine"),
            Map.entry('I', "L-isoleucine"), Map.entry('L', "L-leucine"), Map.entry('K', "L-lysine free base"),
            Map.entry('M', "L-methionine"), Map.entry('F', "L-phenylalanine"), Map.entry('P', "L-proline"),
            Map.entry('S', "L-serine"), Map.entry('T', "L-threonine"), Map.entry('W', "L-tryptophan"),
            Map.entry('Y', "L-tyrosine"), Map.entry('V', "L-valine"));

    public Protein {
        groups = java.util.Collections.unmodifiableMap(new EnumMap<>(groups));
        systems = java.util.Collections.unmodifiableMap(new EnumMap<>(systems));
    }

    /** A definition the library cannot turn into a protein: the message names what, the pointer where. */
    public static final class DefinitionException extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final String pointer;

        public DefinitionException(String pointer, String message) {
            super(message);
            this.pointer = pointer;
        }

        public String pointer() {
            return pointer;
        }
    }

    public static Protein define(String name, Formulation.Protein def, SubstanceLibrary library) {
        Map<ProteinGroup, AcidBaseSystem> set = library.proteinGroups().get(def.pKaSet().orElse(DEFAULT_SET));
        if (set == null) {
            throw new DefinitionException(def.pointer() + "/pKaSet", "no pKa set '" + def.pKaSet().orElse(DEFAULT_SET)
                    + "' in the library; it has " + String.join(", ", library.proteinGroups().keySet()));
        }
        Map<ProteinGroup, Integer> groups = def.chains().isEmpty() ? given(def) : counted(def);
        OptionalDouble computed = def.chains().isEmpty() ? OptionalDouble.empty()
                : OptionalDouble.of(sequenceMass(def, library));
        double mass = def.molarMass().orElseGet(computed::getAsDouble);
        Map<ProteinGroup, AcidBaseSystem> systems = new EnumMap<>(ProteinGroup.class);
        List<Composition.SystemPart> parts = new ArrayList<>();
        for (Map.Entry<ProteinGroup, Integer> e : groups.entrySet()) {
            if (e.getValue() == 0) {
                continue;
            }
            AcidBaseSystem template = set.get(e.getKey());
            if (template == null) {
                throw new DefinitionException(def.pointer(), "the pKa set '" + def.pKaSet().orElse(DEFAULT_SET)
                        + "' has no " + e.getKey().label() + " group");
            }
            List<AcidBaseSystem.Form> forms = template.forms().stream()
                    .map(f -> new AcidBaseSystem.Form(name + " " + f.name(), f.charge())).toList();
            AcidBaseSystem bound = new AcidBaseSystem(name + ": " + e.getKey().label(), forms, template.steps(), true);
            systems.put(e.getKey(), bound);
            // the neutral form: the molecule as weighed carries no net charge of its own; counterions bring theirs
            int neutral = e.getKey().protonatedCharge() == 0 ? 0 : 1;
            parts.add(new Composition.SystemPart(bound.name(), forms.get(neutral).name(), e.getValue()));
        }
        Component solute = new Component(name, 0);
        Map<String, Double> ions = new LinkedHashMap<>();
        Map<String, Double> solutes = new LinkedHashMap<>(Map.of(name, 1.0));
        for (Formulation.Counterion c : def.counterions()) {
            Substance acid;
            try {
                acid = library.lookup(c.substance());
            } catch (LookupException e) {
                throw new DefinitionException(c.pointer() + "/substance", e.getMessage());
            }
            Composition a = acid.composition();
            if (!a.isIonizable()) {
                throw new DefinitionException(c.pointer() + "/substance", "'" + acid.name()
                        + "' is neither an acid nor a salt; a counterion comes with an acid (hydrochloric acid, acetic acid)");
            }
            a.ions().forEach((ion, n) -> ions.merge(ion, n * c.perMole(), Double::sum));
            a.solutes().forEach((s, n) -> solutes.merge(s, n * c.perMole(), Double::sum));
            a.systems().forEach(p -> parts.add(new Composition.SystemPart(p.system(), p.form(), p.count() * c.perMole())));
        }
        Substance substance = new Substance(name, List.of(), Optional.empty(), OptionalDouble.of(mass),
                def.molarMass().isPresent(), false, new Composition(ions, parts, solutes),
                OptionalDouble.of(SPECIFIC_VOLUME * mass), "a protein's partial specific volume, "
                + SPECIFIC_VOLUME + " cm³/g (Buxbaum, Biophysical Chemistry of Proteins, 2011, ch. 25)",
                OptionalDouble.empty(), "defined in the formulation: " + describe(groups), Handling.none(),
                "the formulation");
        return new Protein(name, groups, mass, computed, def.pKaSet().orElse(DEFAULT_SET), systems, solute, substance);
    }

    private static Map<ProteinGroup, Integer> given(Formulation.Protein def) {
        Map<ProteinGroup, Integer> out = new EnumMap<>(ProteinGroup.class);
        def.groups().forEach((label, n) -> out.put(ProteinGroup.named(label), n));
        return out;
    }

    private static Map<ProteinGroup, Integer> counted(Formulation.Protein def) {
        Map<ProteinGroup, Integer> out = new EnumMap<>(ProteinGroup.class);
        for (ProteinGroup g : ProteinGroup.values()) {
            out.put(g, 0);
        }
        for (Formulation.Chain c : def.chains()) {
            for (char r : c.sequence().toCharArray()) {
                ProteinGroup.ofResidue(r).ifPresent(g -> out.merge(g, c.copies(), Integer::sum));
            }
            out.merge(ProteinGroup.N_TERMINUS, c.acetylated() ? 0 : c.copies(), Integer::sum);
            out.merge(ProteinGroup.C_TERMINUS, c.amidated() ? 0 : c.copies(), Integer::sum);
        }
        int free = out.get(ProteinGroup.CYS) - 2 * def.disulfides();
        if (free < 0) {
            throw new DefinitionException(def.pointer() + "/disulfides", def.disulfides() + " disulfide bonds need "
                    + 2 * def.disulfides() + " cysteines, but the chains hold " + out.get(ProteinGroup.CYS));
        }
        out.put(ProteinGroup.CYS, free);
        return out;
    }

    /** g/mol of the molecule from its chains (see the class comment). */
    private static double sequenceMass(Formulation.Protein def, SubstanceLibrary library) {
        Map<Character, Double> residue = new java.util.HashMap<>();
        AMINO_ACIDS.forEach((code, aa) -> residue.put(code, library.lookup(aa).molarMass().orElseThrow()
                - AtomicWeights.WATER));
        double h = AtomicWeights.of("H").orElseThrow();
        double acetyl = 2 * AtomicWeights.of("C").orElseThrow() + 2 * h + AtomicWeights.of("O").orElseThrow();
        double amide = AtomicWeights.of("N").orElseThrow() + h - AtomicWeights.of("O").orElseThrow();
        double m = -2 * h * def.disulfides();
        for (Formulation.Chain c : def.chains()) {
            double chain = AtomicWeights.WATER + (c.acetylated() ? acetyl : 0) + (c.amidated() ? amide : 0);
            for (char r : c.sequence().toCharArray()) {
                Double x = residue.get(r);
                if (x == null) {
                    throw new DefinitionException(c.pointer() + "/sequence", "'" + r + "' is not the one-letter code "
                            + "of one of the 20 standard amino acids");
                }
                chain += x;
            }
            m += c.copies() * chain;
        }
        return m;
    }

    private static String describe(Map<ProteinGroup, Integer> groups) {
        List<String> out = new ArrayList<>();
        groups.forEach((g, n) -> out.add(n + " " + g.label()));
        return String.join(", ", out);
    }

    /** Net charge of one molecule at a pH and temperature: Σ n_g (z_g − α_g), α_g = 1/(1 + 10^(pKa_g − pH)). */
    public double netCharge(double pH, double kelvin) {
        return new Charge(kelvin).value(pH);
    }

    /**
     * The isoelectric point: the pH of zero net charge at a temperature, found on 0–14 by Newton steps on the charge,
     * which falls monotonically with pH; empty where it does not change sign there (no acidic or no basic group).
     */
    public OptionalDouble isoelectricPoint(double kelvin) {
        double lo = 0;
        double hi = 14;
        double zLo = netCharge(lo, kelvin);
        double zHi = netCharge(hi, kelvin);
        if (zLo <= 0 || zHi >= 0) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(RootFinder.solve(new Charge(kelvin), lo, zLo, hi, zHi, 7));
    }

    /** The net charge against pH at one temperature, with its slope dz/dpH = −ln 10 Σ n_g α_g (1 − α_g). */
    private final class Charge implements RootFinder.Function {
        private final double kelvin;
        private double slope;

        Charge(double kelvin) {
            this.kelvin = kelvin;
        }

        @Override
        public double value(double pH) {
            double z = 0;
            slope = 0;
            for (Map.Entry<ProteinGroup, AcidBaseSystem> e : systems.entrySet()) {
                double alpha = 1 / (1 + Math.pow(10, e.getValue().steps().get(0).pKa(kelvin) - pH));
                int n = groups.get(e.getKey());
                z += n * (e.getKey().protonatedCharge() - alpha);
                slope -= Math.log(10) * n * alpha * (1 - alpha);
            }
            return z;
        }

        @Override
        public double slope() {
            return slope;
        }
    }
}
