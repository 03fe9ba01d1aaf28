package org.protolyte.substance;

import java.text.Normalizer;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.DrugSubstance;
import org.protolyte.chemistry.CarbonDioxide;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.SaltSolubility;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.chemistry.Species;
import org.protolyte.document.Suggestions;
import org.protolyte.text.Excerpt;

/**
 * The substances a recipe may name, with the acid–base systems, strong ions and neutral solutes they
 * are made of. Look-up forgives case, spaces, hyphens and '·' versus '.'; it never guesses: an unknown
 * name gets the nearest names, a name shared by several forms gets the forms.
 */
public final class SubstanceLibrary {

    private final Map<String, AcidBaseSystem> systems;
    private final Map<String, List<String>> stepSources;     // system -> source of each step
    private final Map<String, Component> ions;
    private final Map<String, Component> solutes;
    private final Map<String, Substance> substances;      // by canonical name
    private final Map<String, Substance> index;           // by normalised name or synonym
    private final Map<String, List<String>> ambiguous;    // normalised shared name -> forms
    private final Map<String, String> files;              // library file -> SHA-256 of its bytes
    private final List<Species> complexes;                // species of several components, in library order
    private final Map<String, String> complexSources;
    private final List<SolidPhase> phases;                // solids that can form, in library order
    private final Map<String, String> phaseSources;
    private final List<SaltSolubility> solubilities;
    private final Map<String, Map<ProteinGroup, AcidBaseSystem>> proteinGroups;   // pKa set -> its groups
    private final List<Protein> proteins;                                         // a formulation's, once added
    private final List<DrugSubstance> drugs;
    private final Map<String, Fluid> fluids;                                      // by normalised name or synonym
    private final List<Fluid> fluidList;

    SubstanceLibrary(Map<String, AcidBaseSystem> systems, Map<String, List<String>> stepSources,
                     Map<String, Component> ions, Map<String, Component> solutes,
                     Map<String, Substance> substances, Map<String, Substance> index,
                     Map<String, List<String>> ambiguous, Map<String, String> files,
                     Map<String, Species> complexes, Map<String, String> complexSources,
                     Map<String, SolidPhase> phases, Map<String, String> phaseSources,
                     Map<String, SaltSolubility> solubilities,
                     Map<String, Map<ProteinGroup, AcidBaseSystem>> proteinGroups, List<Protein> proteins,
                     Map<String, DrugSubstance> drugs, Map<String, Fluid> fluids) {
        this.proteins = List.copyOf(proteins);
        this.drugs = List.copyOf(drugs.values());
        this.fluidList = List.copyOf(fluids.values());
        Map<String, Fluid> byName = new LinkedHashMap<>();
        for (Fluid f : fluidList) {
            byName.put(normalise(f.name()), f);
            f.synonyms().forEach(x -> byName.put(normalise(x), f));
        }
        this.fluids = java.util.Collections.unmodifiableMap(byName);
        Map<String, Map<ProteinGroup, AcidBaseSystem>> sets = new LinkedHashMap<>();
        proteinGroups.forEach((k, v) -> sets.put(k, java.util.Collections.unmodifiableMap(new java.util.EnumMap<>(v))));
        this.proteinGroups = java.util.Collections.unmodifiableMap(sets);
        this.solubilities = List.copyOf(solubilities.values());
        this.phases = List.copyOf(phases.values());
        this.phaseSources = inOrder(phaseSources);
        this.complexes = List.copyOf(complexes.values());
        this.complexSources = inOrder(complexSources);
        this.systems = inOrder(systems);
        this.stepSources = inOrder(stepSources);
        this.ions = inOrder(ions);
        this.solutes = inOrder(solutes);
        this.substances = new LinkedHashMap<>(substances);
        this.index = inOrder(index);
        this.ambiguous = inOrder(ambiguous);
        this.files = new LinkedHashMap<>(files);
    }

    /** A read-only copy in the library's order: {@code Map.copyOf} iterates in an order that changes from run to run. */
    private static <K, V> Map<K, V> inOrder(Map<K, V> m) {
        return java.util.Collections.unmodifiableMap(new LinkedHashMap<>(m));
    }

    /** The files this library was built from, in order, with the SHA-256 of each file's bytes. */
    public Map<String, String> files() {
        return java.util.Collections.unmodifiableMap(files);
    }

    /** The key names are compared by: lower case, letters and digits only ("Na2HPO4·7H2O" = "na2hpo4 7h2o"). */
    public static String normalise(String name) {
        String s = Normalizer.normalize(name, Normalizer.Form.NFKC).toLowerCase(Locale.ROOT);
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (Character.isLetterOrDigit(c)) {
                b.append(c);
            }
        }
        return b.toString();
    }

    public Substance lookup(String name) {
        String key = normalise(name);
        Substance s = index.get(key);
        if (s != null) {
            return s;
        }
        List<String> forms = ambiguous.get(key);
        if (forms != null) {
            throw new LookupException("'" + Excerpt.of(name) + "' names several forms; name the one that is weighed: "
                    + String.join(", ", forms), forms);
        }
        List<String> near = nearestNames(name);
        String unsought = key.length() > Suggestions.LONGEST_NAME
                ? " (no nearest names are sought for a name of more than " + Suggestions.LONGEST_NAME + " characters)"
                : "";
        String hint = near.isEmpty() ? "; add it to a user library (--substances FILE)" + unsought
                : "; nearest library names: " + String.join(", ", near);
        throw new LookupException("unknown substance '" + Excerpt.of(name) + "'" + hint, near);
    }

    /** Canonical names whose name or synonym is closest to the query, or contains it. */
    private List<String> nearestNames(String name) {
        String key = normalise(name);
        Set<String> out = new LinkedHashSet<>();
        Map<String, String> keyToCanonical = new LinkedHashMap<>();
        index.forEach((k, v) -> keyToCanonical.put(k, v.name()));
        for (String k : Suggestions.nearest(key, keyToCanonical.keySet(), 5)) {
            out.add(keyToCanonical.get(k));
        }
        if (key.length() >= 4) {
            keyToCanonical.forEach((k, v) -> {
                if (k.contains(key)) {
                    out.add(v);
                }
            });
        }
        return new ArrayList<>(out).subList(0, Math.min(5, out.size()));
    }

    public Collection<Substance> substances() {
        return substances.values();
    }

    /**
     * The forms a weighing of {@code s} could have been mistaken for: its other hydrates (the same composition in
     * solution) and the other forms of any shared name it belongs to ("sodium phosphate": the monobasic and dibasic
     * salts and their hydrates), in library order.
     */
    public List<Substance> siblings(Substance s) {
        Set<String> names = new LinkedHashSet<>();
        for (Substance x : substances.values()) {
            if (!x.name().equals(s.name()) && x.composition().equals(s.composition())) {
                names.add(x.name());
            }
        }
        for (List<String> forms : ambiguous.values()) {
            if (forms.contains(s.name())) {
                forms.stream().filter(f -> !f.equals(s.name()) && substances.containsKey(f)).forEach(names::add);
            }
        }
        return names.stream().map(substances::get).toList();
    }

    /**
     * For a name shared by forms that differ only in their water of hydration (sodium acetate: anhydrous and
     * trihydrate), the form with the least water; empty for any other name, including one shared by different species
     * (monobasic and dibasic phosphate).
     */
    public Optional<Substance> formOfHydratesOnly(String name) {
        List<String> forms = ambiguous.get(normalise(name));
        if (forms == null || forms.isEmpty() || !forms.stream().allMatch(substances::containsKey)) {
            return Optional.empty();
        }
        List<Substance> all = forms.stream().map(substances::get).toList();
        boolean sameChemistry = all.stream().allMatch(x -> x.composition().equals(all.get(0).composition()));
        return sameChemistry ? all.stream().min(java.util.Comparator.comparingDouble(Substance::hydrationWater))
                : Optional.empty();
    }

    /** The forms a shared name names, in library order; empty where the name names one substance or none. */
    public List<String> forms(String name) {
        return ambiguous.getOrDefault(normalise(name), List.of());
    }

    public Optional<AcidBaseSystem> system(String name) {
        return Optional.ofNullable(systems.get(name));
    }

    /** The system a CO2 gas phase opens: the one whose most protonated form is dissolved CO2. */
    public Optional<AcidBaseSystem> carbonDioxide() {
        return systems.values().stream().filter(s -> s.forms().get(0).name().equals(CarbonDioxide.DISSOLVED)).findFirst();
    }

    public Collection<AcidBaseSystem> systems() {
        return systems.values();
    }

    /** Complexes and ion pairs: species of several components with their formation constants. */
    public List<Species> complexes() {
        return complexes;
    }

    public String complexSource(String name) {
        return complexSources.getOrDefault(name, "");
    }

    /** Solid phases whose saturation index a check reports. */
    public List<SolidPhase> phases() {
        return phases;
    }

    /** The receiving fluids, in library order. */
    public List<Fluid> fluids() {
        return fluidList;
    }

    /** A receiving fluid by name or synonym (case, spaces and hyphens forgiven). */
    public Optional<Fluid> fluid(String name) {
        return Optional.ofNullable(fluids.get(normalise(name)));
    }

    /** Drug substances whose pH-dependent solubility the report gives; their solids' sources are phase sources. */
    public List<DrugSubstance> drugSubstances() {
        return drugs;
    }

    /** Salts whose published solubility against temperature a check compares with the recipe. */
    public List<SaltSolubility> solubilities() {
        return solubilities;
    }

    public String phaseSource(String name) {
        return phaseSources.getOrDefault(name, "");
    }

    /** The source of each dissociation step of a system, in step order. */
    public List<String> stepSources(String system) {
        return stepSources.getOrDefault(system, List.of());
    }

    /**
     * This library and the proteins a formulation defines: their bound group systems, each one as a solute (the
     * macroion, one particle) and as a substance its lines resolve to.
     */
    public SubstanceLibrary withProteins(List<Protein> proteins) {
        if (proteins.isEmpty()) {
            return this;
        }
        Map<String, AcidBaseSystem> sys = new LinkedHashMap<>(systems);
        Map<String, Component> sol = new LinkedHashMap<>(solutes);
        Map<String, Substance> subs = new LinkedHashMap<>(substances);
        Map<String, Substance> idx = new LinkedHashMap<>(index);
        for (Protein p : proteins) {
            p.systems().values().forEach(s -> sys.put(s.name(), s));
            sol.put(p.solute().name(), p.solute());
            subs.put(p.name(), p.substance());
            idx.put(normalise(p.name()), p.substance());
        }
        Map<String, Species> cx = new LinkedHashMap<>();
        complexes.forEach(c -> cx.put(c.name(), c));
        Map<String, SolidPhase> ph = new LinkedHashMap<>();
        phases.forEach(x -> ph.put(x.name(), x));
        Map<String, SaltSolubility> so = new LinkedHashMap<>();
        solubilities.forEach(x -> so.put(x.name(), x));
        List<Protein> all = new ArrayList<>(this.proteins);
        all.addAll(proteins);
        Map<String, DrugSubstance> dr = new LinkedHashMap<>();
        drugs.forEach(x -> dr.put(x.name(), x));
        Map<String, Fluid> fl = new LinkedHashMap<>();
        fluidList.forEach(x -> fl.put(x.name(), x));
        return new SubstanceLibrary(sys, stepSources, ions, sol, subs, idx, ambiguous, files, cx, complexSources, ph,
                phaseSources, so, proteinGroups, all, dr, fl);
    }

    /** The proteins a formulation defined (see {@link #withProteins}), in its order. */
    public List<Protein> proteins() {
        return proteins;
    }

    /** The pKa sets of protein groups, each with the step of every group it holds, in library order. */
    public Map<String, Map<ProteinGroup, AcidBaseSystem>> proteinGroups() {
        return proteinGroups;
    }

    public Optional<Component> ion(String name) {
        return Optional.ofNullable(ions.get(name));
    }

    public Optional<Component> solute(String name) {
        return Optional.ofNullable(solutes.get(name));
    }
}
