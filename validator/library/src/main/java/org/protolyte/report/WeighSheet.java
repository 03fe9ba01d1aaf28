package org.protolyte.report;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.TitrantResult;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.Ingredient;
import org.protolyte.units.Dimension;
import org.protolyte.units.Quantity;

/**
 * What the recipe resolved to, line by line: the amount as the document writes it, the moles, and what to weigh (g)
 * or measure (mL of stock), per the document's basis and, where a batch size is given, for the batch. Numbers carry
 * {@link #DIGITS} significant digits, the same in every format, but for a mass written in grams, which is what to
 * weigh as written.
 *
 * @param basis the document's basis, e.g. "1 L of solution"
 * @param batch the batch size as given and its multiple of the basis
 */
public record WeighSheet(String basis, Optional<Batch> batch, List<Line> lines, List<String> notes) {

    /** Significant digits of every number on the sheet. */
    public static final int DIGITS = 5;

    public WeighSheet {
        lines = List.copyOf(lines);
        notes = List.copyOf(notes);
    }

    /** A batch of {@code size} (as given), {@code factor} times the document's basis. */
    public record Batch(String size, double factor) {
    }

    /**
     * One component line.
     *
     * @param recorded         the amount as written (digit for digit), or "q.s." for a titrant
     * @param stock            the stock's concentration as written, where the line names one
     * @param mmol             per basis; empty for a titrant without a dose that meets its goal
     * @param grams            of the substance as supplied (its hydrate, its salt), where it is weighed neat
     * @param stockMillilitres mL of the stock, where the line names one
     */
    public record Line(String pointer, String substance, String recorded, Optional<String> stock,
                       Optional<BigDecimal> mmol, Optional<BigDecimal> grams, Optional<BigDecimal> stockMillilitres,
                       Optional<BigDecimal> batchMmol, Optional<BigDecimal> batchGrams,
                       Optional<BigDecimal> batchStockMillilitres) {
    }

    /**
     * The sheet of an analysed formulation. A batch size must be a volume for a final-volume basis and a mass (of
     * water) for a water-mass basis; otherwise the sheet has no batch column and a note says why.
     */
    public static WeighSheet of(FormulationAnalysis a, Optional<Quantity> batchSize) {
        Formulation f = a.recipe().formulation();
        Formulation.Basis b = f.basis();
        String basis = b.finalVolume() ? Numbers.significant(b.amount(), 6).toPlainString() + " L of solution"
                : Numbers.significant(b.amount(), 6).toPlainString() + " kg of water";
        List<String> notes = new ArrayList<>();
        Optional<Batch> batch = batchSize.flatMap(q -> {
            Dimension wanted = b.finalVolume() ? Dimension.VOLUME : Dimension.MASS;
            if (q.dimension() != wanted) {
                notes.add("batch size " + q + " is not " + (b.finalVolume() ? "a volume" : "a mass of water")
                        + ", as the document's basis (" + basis + ") is: no batch amounts");
                return Optional.empty();
            }
            double base = b.finalVolume() ? q.base() : q.base() / 1000;     // L, or kg from g
            return Optional.of(new Batch(q.toString(), base / b.amount()));
        });
        List<Line> lines = new ArrayList<>();
        for (Ingredient ing : a.recipe().ingredients()) {
            Formulation.Line line = ing.line();
            Optional<TitrantResult> titrant = a.titrants().stream().filter(t -> t.ingredient().equals(ing)).findFirst();
            boolean dosed = ing.kind() != Ingredient.Kind.TITRANT
                    || titrant.map(t -> t.used() && t.unreachable().isEmpty()).orElse(false);
            Double moles = a.solution().moles().get(ing);
            Optional<Double> n = dosed && moles != null ? Optional.of(moles) : Optional.empty();
            Optional<Double> g = n.filter(x -> !ing.hasStock() && ing.substance().molarMass().isPresent())
                    .map(x -> x * ing.substance().molarMass().getAsDouble());
            // a mass written in grams is what to weigh, digit for digit: "0.40 g" stays 0.40
            Optional<BigDecimal> asWritten = line.amount().filter(q -> q.unit().code().equals("g") && g.isPresent())
                    .map(q -> new BigDecimal(q.written()));
            Optional<Double> ml = n.filter(x -> ing.hasStock()).map(x -> x / ing.stockMolarity() * 1000);
            String recorded = line.amount().map(Quantity::toString).orElse("q.s.");
            double k = batch.map(Batch::factor).orElse(Double.NaN);
            lines.add(new Line(line.pointer(), ing.substance().name(), recorded,
                    line.stock().map(s -> s.concentration().toString()), digits(n.map(x -> x * 1000)),
                    asWritten.or(() -> digits(g)),
                    digits(ml), digits(n.filter(x -> batch.isPresent()).map(x -> x * 1000 * k)),
                    digits(g.filter(x -> batch.isPresent()).map(x -> x * k)),
                    digits(ml.filter(x -> batch.isPresent()).map(x -> x * k))));
            titrant.filter(t -> t.used() && t.unreachable().isPresent()).ifPresent(t -> notes.add(String.format(
                    Locale.ROOT, "%s: no dose meets its goal, so the sheet gives none", ing.substance().name())));
            titrant.filter(t -> !t.used()).ifPresent(t -> notes.add(String.format(Locale.ROOT,
                    "%s: not needed, the other titrant meets the goal", ing.substance().name())));
        }
        return new WeighSheet(basis, batch, lines, notes);
    }

    private static Optional<BigDecimal> digits(Optional<Double> x) {
        return x.map(v -> Numbers.significant(v, DIGITS));
    }
}
