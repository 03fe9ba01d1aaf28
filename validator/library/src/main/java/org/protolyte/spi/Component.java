package org.protolyte.spi;

import java.util.OptionalDouble;

/**
 * One line of a formulation's composition.
 *
 * @param substance     the substance as the library names it
 * @param pointer       the JSON pointer of the line in the document
 * @param concentration mmol per litre of the final solution at the make-up temperature; empty where the line gives
 *                      no amount (a q.s. titrant before the engine has found it)
 */
public record Component(String substance, String pointer, OptionalDouble concentration) {
}
