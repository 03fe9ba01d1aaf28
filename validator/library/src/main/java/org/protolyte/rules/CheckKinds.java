package org.protolyte.rules;

import java.util.Map;
import java.util.Optional;
import java.util.ServiceLoader;
import java.util.TreeMap;

/** The check kinds available to packs: the shipped ones and any a site adds through ServiceLoader. */
public final class CheckKinds {

    private final Map<String, CheckKind> kinds = new TreeMap<>();

    private CheckKinds() {
    }

    public static CheckKinds load() {
        CheckKinds k = new CheckKinds();
        for (CheckKind c : ServiceLoader.load(CheckKind.class, CheckKinds.class.getClassLoader())) {
            if (k.kinds.putIfAbsent(c.id(), c) != null) {
                throw new IllegalStateException("two check kinds are named '" + c.id() + "'");
            }
        }
        return k;
    }

    public Optional<CheckKind> get(String id) {
        return Optional.ofNullable(kinds.get(id));
    }

    public Map<String, CheckKind> all() {
        return java.util.Collections.unmodifiableMap(kinds);
    }
}
