package org.protolyte.analysis;

import java.util.List;
import java.util.OptionalDouble;

import org.protolyte.substance.Protein;

/**
 * A protein of the formulation at its conditions: its isoelectric point at 25 °C, and per condition its net charge
 * per molecule and its share of the buffer capacity (the self-buffering of a concentrated protein). Groups titrate
 * independently with the pKa set's values, whose spread in folded proteins (about one unit) is in the pH's ±.
 */
public record ProteinCharge(Protein protein, OptionalDouble isoelectricPoint, List<AtCondition> conditions) {

    /** Net charge per molecule and share of β at one condition; NaN where the condition has no pH. */
    public record AtCondition(String condition, double netCharge, double bufferShare) {
    }

    public ProteinCharge {
        conditions = List.copyOf(conditions);
    }

    static List<ProteinCharge> of(List<Protein> proteins, List<ConditionResult> results) {
        return proteins.stream().map(p -> new ProteinCharge(p, p.isoelectricPoint(298.15), results.stream()
                .map(r -> at(p, r)).toList())).toList();
    }

    private static AtCondition at(Protein p, ConditionResult r) {
        if (!r.determinate()) {
            return new AtCondition(r.condition().name(), Double.NaN, Double.NaN);
        }
        var names = p.systems().values().stream().map(s -> s.name()).toList();
        double share = r.buffers().stream().filter(b -> names.contains(b.system()))
                .mapToDouble(BufferContribution::share).sum();
        var s = r.state().orElseThrow();
        return new AtCondition(r.condition().name(), p.netCharge(s.pH(), s.kelvin()), share);
    }
}
