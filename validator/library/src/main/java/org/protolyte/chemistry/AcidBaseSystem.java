package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A weak acid and its conjugate bases, e.g. phosphate: H3PO4, H2PO4-, HPO4-2, PO4-3 with three
 * dissociation steps. The least protonated form is the mass-balance component; each other form is a
 * species with p protons whose cumulative formation constant is the sum of the last p steps:
 * log β_p = Σ pKa (the p most basic steps). A {@code bound} system is one kind of ionizable group of a macroion (the
 * histidines of a protein), its total the count of groups times the macroion's molality (see {@link Component}).
 */
public final class AcidBaseSystem {

    /** A protonation state: its name as written in speciation (H2PO4-) and its charge. */
    public record Form(String name, int charge) {
    }

    private final String name;
    private final List<Form> forms;
    private final List<DissociationStep> steps;
    private final List<Species> species;      // built once: a recipe asks for them per batch
    private final boolean bound;

    public AcidBaseSystem(String name, List<Form> forms, List<DissociationStep> steps) {
        this(name, forms, steps, false);
    }

    public AcidBaseSystem(String name, List<Form> forms, List<DissociationStep> steps, boolean bound) {
        this.name = name;
        this.bound = bound;
        this.forms = List.copyOf(forms);
        this.steps = List.copyOf(steps);
        if (forms.size() != steps.size() + 1) {
            throw new IllegalArgumentException("acid–base system " + name + " has " + forms.size()
                    + " forms and " + steps.size() + " dissociation steps; forms must be one more than steps");
        }
        for (int i = 1; i < forms.size(); i++) {
            if (forms.get(i).charge() != forms.get(i - 1).charge() - 1) {
                throw new IllegalArgumentException("acid–base system " + name
                        + ": each form must carry one charge less than the one before (most protonated first)");
            }
        }
        this.species = buildSpecies();
    }

    /** Most protonated form first (see the class comment). */
    public String name() {
        return name;
    }

    public List<Form> forms() {
        return forms;
    }

    public List<DissociationStep> steps() {
        return steps;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof AcidBaseSystem a && a.name.equals(name) && a.forms.equals(forms) && a.steps.equals(steps)
                && a.bound == bound;
    }

    @Override
    public int hashCode() {
        return name.hashCode();
    }

    @Override
    public String toString() {
        return "AcidBaseSystem[" + name + "]";
    }

    /** The mass-balance component: the least protonated form. */
    public Component basis() {
        Form last = forms.get(forms.size() - 1);
        return new Component(last.name(), last.charge(), bound);
    }

    /** A kind of ionizable group of a macroion. */
    public boolean bound() {
        return bound;
    }

    /** Every form as a species, most protonated first. */
    public List<Species> species() {
        return species;
    }

    private List<Species> buildSpecies() {
        Component basis = basis();
        int n = steps.size();
        List<Species> out = new ArrayList<>();
        for (int i = 0; i < forms.size(); i++) {
            FormationConstant beta = FormationConstant.UNITY;
            for (int k = i; k < n; k++) {
                beta = beta.plus(steps.get(k).association());
            }
            Form f = forms.get(i);
            out.add(new Species(f.name(), f.charge(), Map.of(basis, 1), n - i, beta));
        }
        return List.copyOf(out);
    }

    public int indexOf(String formName) {
        for (int i = 0; i < forms.size(); i++) {
            if (forms.get(i).name().equals(formName)) {
                return i;
            }
        }
        return -1;
    }
}
