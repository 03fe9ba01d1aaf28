package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Function;

import org.protolyte.substance.Protein;

/**
 * A protein of the formulation at its conditions: its isoelectric point at 25 °C, and per condition its net charge
 * per molecule and its share of the buffer capacity (the self-buffering of a concentrated protein). Groups titrate
 * independently with the pKa set's values, whose spread in folded proteins (about one unit) is in the pH's ±.
 */
public record ProteinCharge(Protein protein, OptionalDouble isoelectricPoint, List<AtCondition> conditions) {

    /**
     * Net charge per molecule and share of β at one condition, NaN where the condition has no pH; and the pH change the
     * protein causes there against the buffer alone (every other amount as it is), empty where either has no pH.
     */
    public record AtCondition(String condition, double netCharge, double bufferShare, OptionalDouble pHShift) {
    }

    public ProteinCharge {
        conditions = List.copyOf(conditions);
    }

    /** Each protein at every condition; {@code bufferAlone} gives the pH at each condition without that protein. */
    static List<ProteinCharge> of(List<Protein> proteins, List<ConditionResult> results,
                                  Function<Protein, List<OptionalDouble>> bufferAlone) {
        List<ProteinCharge> out = new ArrayList<>();
        for (Protein p : proteins) {
            List<OptionalDouble> alone = bufferAlone.apply(p);
            List<AtCondition> at = new ArrayList<>();
            for (int i = 0; i < results.size(); i++) {
                at.add(at(p, results.get(i), alone.get(i)));
            }
            out.add(new ProteinCharge(p, p.isoelectricPoint(298.15), at));
        }
        return out;
    }

    private static AtCondition at(Protein p, ConditionResult r, OptionalDouble alone) {
        if (!r.determinate()) {
            return new AtCondition(r.condition().name(), Double.NaN, Double.NaN, OptionalDouble.empty());
        }
        var names = p.systems().values().stream().map(s -> s.name()).toList();
        double share = r.buffers().stream().filter(b -> names.contains(b.system()))
                .mapToDouble(BufferContribution::share).sum();
        var s = r.state().orElseThrow();
        return new AtCondition(r.condition().name(), p.netCharge(s.pH(), s.kelvin()), share,
                alone.isPresent() ? OptionalDouble.of(s.pH() - alone.getAsDouble()) : OptionalDouble.empty());
    }
}
