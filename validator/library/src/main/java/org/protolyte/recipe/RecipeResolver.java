package org.protolyte.recipe;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;
import org.protolyte.document.Problem;
import org.protolyte.document.SourceDocument;
import org.protolyte.substance.LookupException;
import org.protolyte.substance.Fluid;
import org.protolyte.substance.Protein;
import org.protolyte.substance.Substance;
import org.protolyte.substance.SubstanceLibrary;
import org.protolyte.units.Quantity;

import tools.jackson.databind.JsonNode;

/**
 * Resolves each component line to a library substance and its amount to moles (or mol/kg) per basis.
 * A name that does not resolve, a mass without a molar mass, a per-litre amount on a water-mass basis:
 * each is a problem at its line, and all are reported together.
 */
public final class RecipeResolver {

    private static final double DEFAULT_MAKE_UP_KELVIN = 293.15;

    private final SubstanceLibrary library;

    public RecipeResolver(SubstanceLibrary library) {
        this.library = library;
    }

    public Recipe resolve(Formulation f) {
        List<Problem> problems = new ArrayList<>();
        List<Ingredient> ingredients = new ArrayList<>();
        List<Protein> proteins = new ArrayList<>();
        for (Formulation.Line line : f.components()) {
            Substance s;
            if (line.protein().isPresent()) {
                try {
                    s = protein(line, proteins);
                    ingredients.add(ingredient(f, line, s));
                } catch (Protein.DefinitionException e) {
                    problems.add(f.document().problem(e.pointer(), e.getMessage()));
                } catch (AmountException e) {
                    problems.add(f.document().problem(e.pointer, e.getMessage()));
                }
                continue;
            }
            try {
                s = library.lookup(line.substance());
            } catch (LookupException e) {
                Optional<Substance> form = molar(line) ? library.formOfHydratesOnly(line.substance()) : Optional.empty();
                if (form.isEmpty()) {
                    problems.add(f.document().problem(line.pointer() + "/substance", e.getMessage()));
                    continue;
                }
                s = form.get();   // a molar amount of any of its hydrates is the same chemistry (the note says which)
            }
            try {
                ingredients.add(ingredient(f, line, s));
            } catch (AmountException e) {
                problems.add(f.document().problem(e.pointer, e.getMessage()));
            }
        }
        for (Formulation.Admixture a : f.admixtures()) {
            if (library.fluid(a.into()).isEmpty()) {
                problems.add(f.document().problem(a.pointer() + "/into", "'" + a.into() + "' is not a receiving fluid "
                        + "of the library; it has " + String.join(", ", library.fluids().stream().map(Fluid::name)
                        .toList())));
            }
        }
        f.dilution().ifPresent(d -> {
            try {
                if (!library.lookup(d.diluent()).solvent()) {
                    problems.add(f.document().problem(d.pointer() + "/diluent", "the diluent '" + d.diluent()
                            + "' is not water; only dilution with water is computed so far"));
                }
            } catch (LookupException e) {
                problems.add(f.document().problem(d.pointer() + "/diluent", e.getMessage()));
            }
        });
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        double makeUp = f.conditions().stream().filter(c -> c.name().equals("preparation")).findFirst()
                .map(Formulation.Condition::kelvin).orElse(DEFAULT_MAKE_UP_KELVIN);
        Recipe recipe = new Recipe(f, library.withProteins(proteins), ingredients, makeUp);
        recipe.solution(java.util.Map.of());   // fails here, with its place, if the amounts cannot be made up
        return recipe;
    }

    /**
     * A receiving fluid as a recipe: one litre of its components, made up at its own temperature; its problems point
     * into the library file that defines it.
     */
    public Recipe fluid(Fluid fluid) {
        Formulation f = new Formulation(fluid.document(), fluid.name(), Optional.of(fluid.name()), Optional.empty(),
                Optional.empty(), new Formulation.Basis(true, 1.0, fluid.pointer()), fluid.components(),
                Optional.empty(), List.of(new Formulation.Condition("preparation", fluid.kelvin(), true,
                fluid.pointer(), fluid.co2Pascal())), Optional.empty(), Optional.empty(), Optional.empty(), List.of());
        return resolve(f);
    }

    /** A line that defines a protein: its name must be new, as a library name and among the document's proteins. */
    private Substance protein(Formulation.Line line, List<Protein> proteins) {
        String name = line.substance();
        boolean taken = proteins.stream().anyMatch(p -> SubstanceLibrary.normalise(p.name())
                .equals(SubstanceLibrary.normalise(name)));
        try {
            library.lookup(name);
            taken = true;
        } catch (LookupException e) {
            // caught: a new name is what a protein line needs
        }
        if (taken) {
            throw new Protein.DefinitionException(line.pointer() + "/substance", "'" + name + "' already names a "
                    + "substance; a line that defines a protein gives it a name of its own");
        }
        Protein p = Protein.define(name, line.protein().orElseThrow(), library);
        proteins.add(p);
        return p.substance();
    }

    /** The line gives its amount in moles, per litre or per kilogram of water: no hydrate changes the moles. */
    private static boolean molar(Formulation.Line line) {
        return line.amount().map(q -> q.dimension() == org.protolyte.units.Dimension.AMOUNT
                || q.dimension() == org.protolyte.units.Dimension.AMOUNT_CONCENTRATION
                || q.dimension() == org.protolyte.units.Dimension.MOLALITY).orElse(false) && line.stock().isEmpty();
    }

    /** As {@link #molar(Formulation.Line)}, read from the component's tree. */
    private static boolean molar(JsonNode component) {
        if (component.has("stock") || !component.path("amount").isString()) {
            return false;
        }
        try {
            var d = org.protolyte.units.Quantity.parse(component.get("amount").asString()).dimension();
            return d == org.protolyte.units.Dimension.AMOUNT || d == org.protolyte.units.Dimension.AMOUNT_CONCENTRATION
                    || d == org.protolyte.units.Dimension.MOLALITY;
        } catch (RuntimeException e) {
            return false;   // caught: an amount that does not parse is its own problem, named by the reader
        }
    }

    /** Names under /components/N/substance that the library does not resolve, read straight from the tree. */
    public List<Problem> unresolvedNames(SourceDocument doc) {
        List<Problem> out = new ArrayList<>();
        JsonNode comps = doc.root().path("components");
        for (int i = 0; i < comps.size(); i++) {
            JsonNode name = comps.get(i).path("substance");
            if (name.isString() && !comps.get(i).has("protein")) {
                try {
                    library.lookup(name.asString());
                } catch (LookupException e) {
                    if (library.formOfHydratesOnly(name.asString()).isEmpty() || !molar(comps.get(i))) {
                        out.add(doc.problem("/components/" + i + "/substance", e.getMessage()));
                    }
                }
            }
        }
        return out;
    }

    private static final class AmountException extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final String pointer;

        AmountException(String pointer, String message) {
            super(message);
            this.pointer = pointer;
        }
    }

    private Ingredient ingredient(Formulation f, Formulation.Line line, Substance s) {
        double molarity = 0;
        double stockDensity = line.stock().flatMap(Formulation.Stock::density).orElse(0.0);
        if (line.stock().isPresent()) {
            molarity = stockMolarity(line.stock().get(), s);
        }
        if (line.isTitrant()) {
            if (s.solvent() || !s.composition().isIonizable()) {
                throw new AmountException(line.pointer() + "/adjustTo",
                        "'" + s.name() + "' is neither an acid nor a base and cannot adjust the pH");
            }
            return new Ingredient(line, s, Ingredient.Kind.TITRANT, 0, molarity, stockDensity);
        }
        Quantity q = line.amount().orElseThrow();
        String at = line.pointer() + "/amount";
        boolean finalVolume = f.basis().finalVolume();
        double basis = f.basis().amount();
        double n;
        switch (q.dimension()) {
            case MASS -> n = q.base() / molarMass(s, at);
            case AMOUNT -> n = q.base();
            case VOLUME -> {
                if (molarity > 0) {
                    n = q.base() * molarity;
                } else {
                    n = q.base() * 1000 * neatDensity(line, s, at) / molarMass(s, at);
                }
            }
            case AMOUNT_CONCENTRATION -> n = perLitre(finalVolume, at, q) * basis;
            case MASS_CONCENTRATION -> n = perLitre(finalVolume, at, q) * basis / molarMass(s, at);
            case VOLUME_FRACTION -> n = perLitre(finalVolume, at, q) * basis * 1000 * neatDensity(line, s, at)
                    / molarMass(s, at);
            case MOLALITY -> {
                return new Ingredient(line, s, Ingredient.Kind.MOLALITY, q.base(), molarity, stockDensity);
            }
            case MASS_FRACTION -> throw new AmountException(at, "% w/w is accepted for a stock concentration; "
                    + "for a component give g/L, % w/v, mol/kg or a mass per basis");
            default -> throw new AmountException(at, "an amount cannot be " + q.dimension().description());
        }
        return new Ingredient(line, s, Ingredient.Kind.MOLES, n, molarity, stockDensity);
    }

    private static double perLitre(boolean finalVolume, String at, Quantity q) {
        if (!finalVolume) {
            throw new AmountException(at, "'" + q + "' is per litre of solution, but the basis is a water mass; "
                    + "give mol/kg, or a mass or amount per basis, or use a finalVolume basis");
        }
        return q.base();
    }

    private static double molarMass(Substance s, String at) {
        if (s.molarMass().isEmpty()) {
            throw new AmountException(at, "'" + s.name() + "' has no molar mass in the library, so a mass or "
                    + "mass concentration cannot be converted to moles; give an amount in mol or mmol/L");
        }
        return s.molarMass().getAsDouble();
    }

    private static double neatDensity(Formulation.Line line, Substance s, String at) {
        Optional<Double> d = line.density().or(() -> s.density().isPresent()
                ? Optional.of(s.density().getAsDouble()) : Optional.empty());
        return d.orElseThrow(() -> new AmountException(at, "a volume of '" + s.name()
                + "' needs its density (\"density\": \"1.05 g/mL\") or a stock (\"stock\": {\"concentration\": ...})"));
    }

    private static double stockMolarity(Formulation.Stock stock, Substance s) {
        Quantity c = stock.concentration();
        String at = stock.pointer() + "/concentration";
        return switch (c.dimension()) {
            case AMOUNT_CONCENTRATION -> c.base();
            case MASS_CONCENTRATION -> c.base() / molarMass(s, at);
            case MASS_FRACTION -> c.base() * stock.density().orElseThrow() * 1000 / molarMass(s, at);
            default -> throw new AmountException(at, "a stock concentration cannot be " + c.dimension().description());
        };
    }
}
