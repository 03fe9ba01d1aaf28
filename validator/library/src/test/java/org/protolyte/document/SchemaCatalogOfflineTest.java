package org.protolyte.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.reflect.Field;
import java.net.InetSocketAddress;
import java.net.Proxy;
import java.net.ProxySelector;
import java.net.SocketAddress;
import java.net.URI;
import java.net.URL;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.TestDocs;

import com.networknt.schema.Schema;
import com.networknt.schema.SchemaException;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;

import tools.jackson.databind.json.JsonMapper;

class SchemaCatalogOfflineTest {

    /** Records every URI a URLConnection would open, and refuses it. */
    private static final class NetworkSpy extends ProxySelector {
        final List<URI> seen = new CopyOnWriteArrayList<>();

        @Override
        public List<Proxy> select(URI uri) {
            seen.add(uri);
            // a closed local port: an attempted fetch fails at once instead of reaching the network
            return List.of(new Proxy(Proxy.Type.HTTP, new InetSocketAddress("127.0.0.1", 9)));
        }

        @Override
        public void connectFailed(URI uri, SocketAddress sa, IOException ioe) {
        }
    }

    private ProxySelector previous;
    private NetworkSpy spy;

    @BeforeEach
    void installSpy() {
        previous = ProxySelector.getDefault();
        spy = new NetworkSpy();
        ProxySelector.setDefault(spy);
    }

    @AfterEach
    void removeSpy() {
        ProxySelector.setDefault(previous);
    }

    private static SchemaRegistry registryOf(SchemaCatalog catalog) throws ReflectiveOperationException {
        Field f = SchemaCatalog.class.getDeclaredField("registry");
        f.setAccessible(true);
        return (SchemaRegistry) f.get(catalog);
    }

    @Test
    void networkSpySeesAPlainUrlConnection() throws Exception {
        URL url = URI.create("http://tst-remote.example/schema.json").toURL();
        assertThrows(IOException.class, () -> url.openStream().close());
        assertFalse(spy.seen.isEmpty(), "the spy must notice a fetch, or the tests below prove nothing");
    }

    @ParameterizedTest
    @ValueSource(strings = {"https://protolyte.org/schemas/formulation.schema.json",
            "https://protolyte.org/schemas/anything.json", "classpath:schemas/x.json",
            "https://json-schema.org/draft/2020-12/schema"})
    void ownAndMetaSchemaIrisAreLocal(String iri) {
        assertTrue(SchemaCatalog.isLocal(iri));
    }

    @ParameterizedTest
    @ValueSource(strings = {"https://tst-remote.example/schema.json", "http://protolyte.org/schemas/formulation.schema.json",
            "https://protolyte.org/schemas-other/x.json", "https://protolyte.org.tst-remote.example/schemas/x.json",
            "http://json-schema.org/draft-07/schema", "file:///etc/passwd"})
    void otherIrisAreNotLocal(String iri) {
        assertFalse(SchemaCatalog.isLocal(iri));
    }

    @ParameterizedTest
    @ValueSource(strings = {"https://tst-remote.example/schema.json", "http://tst-remote.example/schema.json"})
    void registryRefusesARemoteSchemaWithoutFetchingIt(String iri) throws Exception {
        SchemaRegistry registry = registryOf(new SchemaCatalog());
        SchemaException e = assertTimeoutPreemptively(Duration.ofSeconds(5),
                () -> assertThrows(SchemaException.class, () -> registry.getSchema(SchemaLocation.of(iri))));
        assertTrue(e.getMessage().contains("not allowed"), e.getMessage());
        assertEquals(List.of(), spy.seen);
    }

    @ParameterizedTest
    @ValueSource(strings = {"{\"$ref\": \"https://tst-remote.example/remote.schema.json\"}",
            "{\"$ref\": \"http://tst-remote.example/other.json#/$defs/x\"}",
            "{\"$schema\": \"https://tst-remote.example/meta-schema\", \"type\": \"object\"}"})
    void schemaReferringToARemoteSchemaFailsFastWithoutFetching(String schemaText) throws Exception {
        SchemaRegistry registry = registryOf(new SchemaCatalog());
        var node = JsonMapper.builder().build().readTree(schemaText);
        assertTimeoutPreemptively(Duration.ofSeconds(5), () -> assertThrows(SchemaException.class, () -> {
            Schema s = registry.getSchema(SchemaLocation.of(SchemaCatalog.ID_PREFIX + "tst-probe.json"), node);
            s.validate(JsonMapper.builder().build().readTree("{}"));
        }));
        assertEquals(List.of(), spy.seen);
    }

    @Test
    void documentNamingARemoteSchemaIsValidatedWithoutFetchingIt() {
        String json = TestDocs.formulation(TestDocs.ACETATE, "")
                .replaceFirst("\\{", "{\n\"\\$schema\": \"https://tst-remote.example/formulation.schema.json\",");
        SchemaCatalog catalog = new SchemaCatalog();
        List<Problem> problems = catalog.validate(new JsonReader().read("t.json", TestDocs.bytes(json)),
                FormulationReader.SCHEMA);
        assertEquals(List.of(), problems);
        assertEquals(List.of(), spy.seen);
    }
}
