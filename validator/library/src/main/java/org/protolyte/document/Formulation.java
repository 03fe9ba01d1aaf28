package org.protolyte.document;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.units.Quantity;

/**
 * A formulation document as read and checked: quantities parsed and of the right dimension, every
 * part keeping its JSON pointer so findings can name their place. Temperatures are kelvin.
 */
public record Formulation(SourceDocument document, String id, Optional<String> title, Optional<String> revision,
                          Optional<String> intendedUse, Basis basis, List<Line> components,
                          Optional<PhTarget> pHTarget, List<Condition> conditions, Optional<Double> doseLitres,
                          Optional<Double> dosesPerDay,
                          Optional<Dilution> dilution, List<Admixture> admixtures) {

    /**
     * The product mixed into a receiving fluid of the library (an infusion fluid, or a plasma model for the injection
     * site): {@code productParts} volumes of product with {@code fluidParts} of the fluid.
     */
    public record Admixture(String into, double productParts, double fluidParts, String pointer) {
        /** "1 + 9". */
        public String ratio() {
            return fmt(productParts) + " + " + fmt(fluidParts);
        }

        private static String fmt(double x) {
            return x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x);
        }
    }

    /** A concentrate diluted before use: final volume per volume of concentrate, with the diluent's name. */
    public record Dilution(double factor, String diluent, String pointer) {
    }

    /** Two temperatures within 0.005 K are the same condition (document values carry two decimals of °C). */
    public static boolean sameTemperature(double kelvin, double other) {
        return Math.abs(kelvin - other) < 0.005;
    }

    public Formulation {
        components = List.copyOf(components);
        conditions = List.copyOf(conditions);
        admixtures = List.copyOf(admixtures);
    }

    /** The recipe makes {@code finalVolume} of solution, or is dissolved in {@code waterMass} of water. */
    public record Basis(boolean finalVolume, double amount, String pointer) {
        /** Litres of solution under finalVolume, kilograms of water under waterMass. */
        public double amount() {
            return amount;
        }
    }

    /** One component line of the recipe; {@code tolerance}: the weighing tolerance, a fraction (0.02 = ±2 %). */
    public record Line(int index, String substance, Optional<Quantity> amount, Optional<Stock> stock,
                       Optional<Adjustment> adjustTo, Optional<Double> density, String pointer,
                       Optional<Double> tolerance, Optional<Protein> protein) {
        public Line(int index, String substance, Optional<Quantity> amount, Optional<Stock> stock,
                    Optional<Adjustment> adjustTo, Optional<Double> density, String pointer,
                    Optional<Double> tolerance) {
            this(index, substance, amount, stock, adjustTo, density, pointer, tolerance, Optional.empty());
        }

        public boolean isTitrant() {
            return adjustTo.isPresent();
        }
    }

    /**
     * A protein or peptide the line defines instead of naming a library substance: its chains (one-letter sequences)
     * or its counts of ionizable groups by label (N-terminus, C-terminus, Asp, Glu, His, Cys, Tyr, Lys, Arg), the
     * disulfide bonds (their cysteines do not titrate), a stated molar mass (g/mol; required with counts), the pKa set
     * by name (empty: the library's default) and the acids that come with it per mole (peptide·2 HCl, acetate salts).
     */
    public record Protein(List<Chain> chains, java.util.Map<String, Integer> groups, int disulfides,
                          OptionalDouble molarMass, Optional<String> pKaSet, List<Counterion> counterions,
                          String pointer) {
        public Protein {
            chains = List.copyOf(chains);
            groups = java.util.Map.copyOf(groups);
            counterions = List.copyOf(counterions);
        }
    }

    /** One chain: its sequence, how many copies the molecule holds, and whether its termini are blocked. */
    public record Chain(String sequence, int copies, boolean acetylated, boolean amidated, String pointer) {
    }

    /** An acid (a library substance) that comes with each mole of the protein: its counterion and protons. */
    public record Counterion(String substance, double perMole, String pointer) {
    }

    /** A liquid stock: concentration (amount, mass or mass-fraction) and density in g/mL where given. */
    public record Stock(Quantity concentration, Optional<Double> density, String pointer) {
    }

    /**
     * q.s. to a pH at a temperature; without a pH the document's pH target is meant. {@code atVolume}: the
     * fraction of the final volume at which the meter is read before making up to volume (1 = at volume).
     */
    public record Adjustment(OptionalDouble pH, double kelvin, String pointer, double atVolume) {
    }

    /** pH between min and max (value ± tolerance is stored as such) at a temperature. */
    public record PhTarget(double min, double max, double kelvin, boolean temperatureStated, String pointer) {
        public double midpoint() {
            return Double.isInfinite(min) ? max : Double.isInfinite(max) ? min : (min + max) / 2;
        }

        public boolean contains(double pH) {
            return pH >= min - 1e-9 && pH <= max + 1e-9;
        }
    }

    /**
     * A named state of the solution; {@code implicit} when the reader added it. {@code co2Pascal}: the CO2
     * partial pressure of the gas phase it is open to, absent for a closed solution.
     */
    public record Condition(String name, double kelvin, boolean implicit, String pointer, OptionalDouble co2Pascal) {
        public Condition(String name, double kelvin, boolean implicit, String pointer) {
            this(name, kelvin, implicit, pointer, OptionalDouble.empty());
        }

        public Condition withCo2(OptionalDouble pascal) {
            return new Condition(name, kelvin, implicit, pointer, pascal);
        }
    }
}
