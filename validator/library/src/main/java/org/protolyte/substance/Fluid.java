package org.protolyte.substance;

import java.util.List;
import java.util.OptionalDouble;

import org.protolyte.document.Formulation;
import org.protolyte.document.SourceDocument;

/**
 * A receiving fluid a product is mixed into: its components per litre (as formulation lines, their pointers into the
 * library file that defines it) and the temperature and CO2 partial pressure at which a mixture with it is judged.
 *
 * @param co2Pascal empty: closed
 */
public record Fluid(String name, List<String> synonyms, List<Formulation.Line> components, double kelvin,
                    OptionalDouble co2Pascal, String source, SourceDocument document, String pointer) {

    public Fluid {
        synonyms = List.copyOf(synonyms);
        components = List.copyOf(components);
    }
}
