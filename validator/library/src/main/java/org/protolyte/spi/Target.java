package org.protolyte.spi;

/**
 * The document's pH target: the range the pH must lie in at a temperature.
 *
 * @param min         lowest pH (negative infinity where the target states only a maximum)
 * @param max         highest pH (positive infinity where it states only a minimum)
 * @param temperature °C at which the target holds (25 °C where the document states none)
 * @param pointer     the JSON pointer of the target in the document
 */
public record Target(double min, double max, double temperature, String pointer) {
}
