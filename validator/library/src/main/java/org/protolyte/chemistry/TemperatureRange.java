package org.protolyte.chemistry;

/** The temperatures (kelvin) over which a constant or a formulation is valid. */
public record TemperatureRange(double minKelvin, double maxKelvin) {

    public static final TemperatureRange UNBOUNDED = new TemperatureRange(0, Double.POSITIVE_INFINITY);

    public TemperatureRange {
        if (!(minKelvin <= maxKelvin)) {
            throw new IllegalArgumentException("temperature range is empty: " + minKelvin + " K to " + maxKelvin + " K");
        }
    }

    public static TemperatureRange celsius(double min, double max) {
        return new TemperatureRange(min + Thermo.KELVIN_OFFSET, max + Thermo.KELVIN_OFFSET);
    }

    public boolean contains(double kelvin) {
        return kelvin >= minKelvin - 1e-9 && kelvin <= maxKelvin + 1e-9;
    }

    public TemperatureRange intersect(TemperatureRange other) {
        double lo = Math.max(minKelvin, other.minKelvin);
        double hi = Math.min(maxKelvin, other.maxKelvin);
        return new TemperatureRange(lo, Math.max(lo, hi));
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT, "%.0f–%.0f °C",
                minKelvin - Thermo.KELVIN_OFFSET, maxKelvin - Thermo.KELVIN_OFFSET);
    }
}
