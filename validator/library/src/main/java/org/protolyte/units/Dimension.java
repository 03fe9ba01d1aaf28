package org.protolyte.units;

/** What a quantity measures. Each accepted unit belongs to exactly one dimension. */
public enum Dimension {
    MASS("a mass"),
    VOLUME("a volume"),
    AMOUNT("an amount of substance"),
    AMOUNT_CONCENTRATION("an amount concentration (per litre of solution)"),
    MASS_CONCENTRATION("a mass concentration (per litre of solution)"),
    MOLALITY("a molality (per kilogram of water)"),
    VOLUME_FRACTION("a volume fraction of the solution"),
    MASS_FRACTION("a mass fraction of the solution"),
    FRACTION("a fraction (%)"),
    TEMPERATURE("a temperature"),
    PRESSURE("a pressure"),
    DENSITY("a density"),
    MOLAR_MASS("a molar mass");

    private final String description;

    Dimension(String description) {
        this.description = description;
    }

    public String description() {
        return description;
    }
}
