package org.protolyte.maven;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

import org.protolyte.api.ConfigurationException;
import org.protolyte.api.Validator;

/**
 * The command line's {@code --rules} values on a validator's builder. A value that is a pack's name (lower case,
 * hyphens: {@code parenteral}) names a shipped pack; anything else is a pack file, relative to the project's folder.
 * Plain, it replaces the intended use's choice; with a leading {@code +} it joins the choice.
 *
 * @param files the pack files to load, each once
 * @param only  the packs that replace the choice (names, or files by the name they are added under)
 * @param also  the packs that join it
 */
record RuleChoice(List<Path> files, List<String> only, List<String> also) {

    /** A rule pack's name, as schemas/rule-pack.schema.json has it. */
    private static final Pattern PACK_NAME = Pattern.compile("[a-z0-9]+(-[a-z0-9]+)*");

    RuleChoice {
        files = List.copyOf(files);
        only = List.copyOf(only);
        also = List.copyOf(also);
    }

    static RuleChoice of(List<String> values, Path basedir) throws ConfigurationException {
        List<Path> files = new ArrayList<>();
        List<String> only = new ArrayList<>();
        List<String> also = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (String value : values) {
            String v = value == null ? "" : value.strip();
            boolean joins = v.startsWith("+");
            String pack = joins ? v.substring(1) : v;
            if (pack.isEmpty()) {
                problems.add("rules: '" + v + "' names no rule pack (a shipped name, a file, or either after '+')");
                continue;
            }
            if (!PACK_NAME.matcher(pack).matches()) {
                Path file = basedir.resolve(pack).normalize();
                if (!files.contains(file)) {
                    files.add(file);
                }
                pack = file.toString();
            }
            (joins ? also : only).add(pack);
        }
        if (!problems.isEmpty()) {
            throw new ConfigurationException(problems);
        }
        return new RuleChoice(files, only, also);
    }

    Validator.Builder applyTo(Validator.Builder builder) {
        files.forEach(builder::rulePack);
        return builder.onlyRulePacks(only.toArray(String[]::new)).alsoRulePacks(also.toArray(String[]::new));
    }
}
