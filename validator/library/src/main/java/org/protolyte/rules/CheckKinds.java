package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.ServiceLoader;
import java.util.TreeMap;

import org.protolyte.plugin.Plugins;

/**
 * The check kinds available to packs: the shipped ones, and a site's ({@link org.protolyte.spi.CheckKind}) from the
 * class path, the module path or a plugin folder, with the places they came from.
 */
public final class CheckKinds {

    private final Map<String, CheckKind> kinds = new TreeMap<>();
    private final List<Plugins.Origin> plugins;

    private CheckKinds(List<Plugins.Origin> plugins) {
        this.plugins = List.copyOf(plugins);
    }

    /** The shipped kinds and those the class path or module path provides. */
    public static CheckKinds load() {
        try {
            return load(Plugins.found());
        } catch (Plugins.Unusable e) {
            throw new IllegalStateException("the class path's plugins cannot be used: " + e.getMessage(), e);
        }
    }

    /** The shipped kinds and the plugins' ({@link Plugins#found}); a kind that cannot be used is refused by name. */
    public static CheckKinds load(Plugins found) throws Plugins.Unusable {
        CheckKinds k = new CheckKinds(found.origins());
        List<String> problems = new ArrayList<>();
        for (CheckKind c : ServiceLoader.load(CheckKind.class, CheckKinds.class.getClassLoader())) {
            k.put(c, "shipped", problems);
        }
        for (Plugins.Kind p : found.kinds()) {
            try {
                k.put(PluginCheck.of(p.kind(), p.origin().describe()), p.origin().describe(), problems);
            } catch (IllegalArgumentException e) {
                problems.add(e.getMessage());
            } catch (RuntimeException | LinkageError e) {   // a site's code answering its own declarations with a throw
                problems.add("check kind " + p.kind().getClass().getName() + " (" + p.origin().describe()
                        + ") cannot be used: " + e);
            }
        }
        if (!problems.isEmpty()) {
            throw new Plugins.Unusable(problems);
        }
        return k;
    }

    private void put(CheckKind c, String from, List<String> problems) {
        CheckKind before = kinds.putIfAbsent(c.id(), c);
        if (before != null) {
            problems.add("two check kinds are named '" + c.id() + "': " + origin(before) + " and " + from);
        }
    }

    private static String origin(CheckKind c) {
        return c instanceof PluginCheck<?> p ? p.origin() : "shipped";
    }

    public Optional<CheckKind> get(String id) {
        return Optional.ofNullable(kinds.get(id));
    }

    public Map<String, CheckKind> all() {
        return java.util.Collections.unmodifiableMap(kinds);
    }

    /** The places a site's kinds and libraries came from, for the reports' provenance. */
    public List<Plugins.Origin> plugins() {
        return plugins;
    }
}
