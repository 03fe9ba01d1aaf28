package org.protolyte.document;

import java.util.Optional;

import org.protolyte.units.Quantity;

/** The plausibility of a temperature read from any document: one check, shared by every reader. */
public final class Temperatures {

    private Temperatures() {
    }

    /** Why a temperature cannot be used, or empty: nothing is colder than absolute zero. */
    public static Optional<String> implausible(Quantity temperature) {
        return temperature.base() > 0 ? Optional.empty()
                : Optional.of("temperature " + temperature + " is below absolute zero");
    }
}
