package org.protolyte.report;

import java.util.List;

import java.util.Optional;

import org.protolyte.plugin.Plugins;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.analysis.TitrantResult;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.document.Formulation;
import org.protolyte.document.Location;
import org.protolyte.rules.Finding;

import tools.jackson.core.StreamWriteFeature;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/** The machine-readable report; its schema is {@code schemas/report.schema.json}. */
public final class JsonRenderer {

    /**
     * Streaming writes several values to one writer: the mapper must not close it after each. One for every renderer:
     * a mapper is immutable and thread-safe, and building one (with its serializer caches cold) costs more than a
     * small document's report.
     */

    /** One drug at one condition or admixture: dissolved, solubility, the limiting solid, the margin and its range. */
    private static void drugAt(ObjectNode c, org.protolyte.analysis.DrugSolubility.AtCondition x) {
        c.put("dissolvedMmolPerLitre", Numbers.significant(x.dissolved() * 1000, 4))
                .put("solubilityMmolPerLitre", Numbers.significant(x.solubility() * 1000, 4))
                .put("limitingSolid", x.limiting().name())
                .put("log10Fraction", Numbers.decimals(x.log10Fraction(), 3))
                .put("log10FractionUncertainty", Numbers.decimals(x.uncertainty(), 3))
                .put("extrapolated", !x.inRange());
        x.window().ifPresentOrElse(w -> {
            ObjectNode r = c.putObject("dissolvedRange");
            w.low().ifPresent(v -> r.put("abovePH", Numbers.decimals(v, 2)));
            w.high().ifPresent(v -> r.put("belowPH", Numbers.decimals(v, 2)));
        }, () -> c.putNull("dissolvedRange"));
        if (!x.pHMax().isEmpty()) {
            ObjectNode m = c.putObject("pHMax");
            x.pHMax().forEach((salt, v) -> m.put(salt, Numbers.decimals(v, 2)));
        }
    }
    private static final JsonMapper MAPPER = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT)
            .disable(StreamWriteFeature.AUTO_CLOSE_TARGET).build();
    private final Optional<org.protolyte.units.Quantity> batchSize;

    /** Weigh sheets per the document's basis only. */
    public JsonRenderer() {
        this(Optional.empty());
    }

    /** @param batchSize the batch the weigh sheets also give amounts for (--batch-size) */
    public JsonRenderer(Optional<org.protolyte.units.Quantity> batchSize) {
        this.batchSize = batchSize;
    }

    public String render(RunReport run) {
        return MAPPER.writeValueAsString(tree(run)) + System.lineSeparator();
    }

    /**
     * A report written as it goes: {@link #begin} opens it, {@link Stream#document} adds one document's report,
     * {@link Stream#end} closes it with what was skipped and the summary.
     */
    public Stream begin(java.io.Writer out, RunSummary run) throws java.io.IOException {
        ObjectNode tool = MAPPER.createObjectNode();
        fillTool(tool, run.toolVersion(), run.generatedAt(), run.libraryFiles(), run.plugins());
        run.asOf().ifPresent(d -> tool.put("asOf", d.toString()));
        out.write("{\n\"tool\" : " + MAPPER.writeValueAsString(tool) + ",\n\"reports\" : [");
        return new Stream(out);
    }

    /** One streamed report; not shared between threads. */
    public final class Stream {
        private final java.io.Writer out;
        private boolean first = true;

        private Stream(java.io.Writer out) {
            this.out = out;
        }

        public void document(DocumentReport r) throws java.io.IOException {
            out.write(first ? " " : ", ");
            MAPPER.writeValue(out, JsonRenderer.this.document(r));
            first = false;
        }

        public void end(RunSummary run) throws java.io.IOException {
            ObjectNode tail = MAPPER.createObjectNode();
            ArrayNode skipped = tail.putArray("skipped");
            run.skipped().forEach(x -> skipped.addObject().put("source", x.source()).put("reason", x.reason()));
            ObjectNode summary = tail.putObject("summary");
            summary.put("documents", run.documents());
            for (Status s : Status.values()) {
                summary.put(s.code(), run.count(s));
            }
            summary.put("exitCode", run.exitCode());
            out.write(" ],\n\"skipped\" : " + MAPPER.writeValueAsString(skipped)
                    + ",\n\"summary\" : " + MAPPER.writeValueAsString(summary) + "\n}" + System.lineSeparator());
        }
    }

    private void fillTool(ObjectNode tool, String version, java.time.Instant generatedAt,
                          java.util.Map<String, String> libraryFiles, List<Plugins.Origin> plugins) {
        tool.put("name", "Protolyte");
        tool.put("version", version);
        tool.put("caution", RunReport.CAUTION);
        tool.put("pHConvention", "pH = −log10(γH·mH): up to ionic strength 0.1 mol/kg the conventional scale "
                + "(Bates–Guggenheim convention, Buck et al., Pure Appl. Chem. 74 (2002) 2169) with γH from the Davies "
                + "equation; from 0.3 mol/kg γH from Pitzer's equations (their own single-ion scale), blended between");
        tool.put("uncertainty", RunReport.UNCERTAINTY);
        tool.put("generatedAt", generatedAt.toString());
        ArrayNode library = tool.putArray("substanceLibrary");
        libraryFiles.forEach((source, sha) -> library.addObject().put("source", source).put("sha256", sha));
        ArrayNode loaded = tool.putArray("plugins");
        for (Plugins.Origin o : plugins) {
            ObjectNode p = loaded.addObject().put("location", o.location());
            o.sha256().ifPresent(h -> p.put("sha256", h));
            o.checkKinds().forEach(p.withArray("checkKinds")::add);
            o.substanceLibraries().forEach(p.withArray("substanceLibraries")::add);
        }
    }

    public ObjectNode tree(RunReport run) {
        ObjectNode root = MAPPER.createObjectNode();
        ObjectNode tool = root.putObject("tool");
        fillTool(tool, run.toolVersion(), run.generatedAt(), run.libraryFiles(), run.plugins());
        ArrayNode reports = root.putArray("reports");
        for (DocumentReport r : run.reports()) {
            reports.add(document(r));
        }
        ArrayNode skipped = root.putArray("skipped");
        run.skipped().forEach(x -> skipped.addObject().put("source", x.source()).put("reason", x.reason()));
        ObjectNode summary = root.putObject("summary");
        summary.put("documents", run.reports().size());
        for (Status s : Status.values()) {
            summary.put(s.code(), run.count(s));
        }
        summary.put("exitCode", run.exitCode());
        return root;
    }

    /** A batch record: its master, the additions against it, the measurements against prediction, the candidates. */
    private void batch(ObjectNode o, BatchAnalysis b) {
        o.put("batch", b.record().batch());
        ObjectNode m = o.putObject("master");
        m.put("id", b.record().master().id());
        b.record().master().revision().ifPresent(x -> m.put("revision", x));
        m.put("source", b.record().master().document().source());
        o.put("scale", Numbers.significant(b.scale(), 6));
        ArrayNode adds = o.putArray("additions");
        for (BatchAnalysis.AdditionCheck c : b.additions()) {
            ObjectNode x = adds.addObject();
            x.put("match", c.match().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
            c.expected().ifPresent(s -> x.put("master", s.name()));
            c.used().ifPresent(s -> x.put("used", s.name()));
            c.addition().ifPresent(a -> x.put("step", a.step()).put("pointer", a.pointer())
                    .put("recorded", a.amount().toString()));
            if (Double.isFinite(c.expectedMoles())) {
                x.put("expectedMmol", Numbers.significant(c.expectedMoles() * 1000, 5));
            }
            x.put("actualMmol", Numbers.significant(c.actualMoles() * 1000, 5));
            if (Double.isFinite(c.deviation())) {
                x.put("deviation", Numbers.significant(c.deviation(), 3));
            }
        }
        ArrayNode obs = o.putArray("observations");
        for (BatchAnalysis.Observation x : b.observations()) {
            ObjectNode y = obs.addObject().put("kind", x.kind().name().toLowerCase(java.util.Locale.ROOT))
                    .put("label", x.label()).put("measured", x.measured()).put("pointer", x.pointer());
            if (Double.isNaN(x.predicted())) {
                y.putNull("predicted");
            } else {
                y.put("predicted", Numbers.significant(x.predicted(), 4));
            }
        }
        ArrayNode cands = o.putArray("candidates");
        for (BatchAnalysis.Candidate c : b.candidates()) {
            ObjectNode y = cands.addObject().put("cause", c.cause());
            ArrayNode p = y.putArray("predicted");
            for (double v : c.predicted()) {
                if (Double.isNaN(v)) {
                    p.addNull();
                } else {
                    p.add(Numbers.significant(v, 4));
                }
            }
        }
    }

    private ObjectNode document(DocumentReport r) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("source", r.source());
        r.sha256().ifPresent(h -> n.put("sha256", h));
        r.id().ifPresent(id -> n.put("id", id));
        n.put("status", r.status().code());
        ArrayNode packs = n.putArray("rulePacks");
        r.packs().forEach(p -> packs.addObject().put("name", p.name()).put("version", p.version())
                .put("source", p.document().source()).put("sha256", p.sha256()));
        r.analysis().ifPresent(a -> analysis(n, a));
        if (r.batch().isEmpty()) {
            r.analysis().ifPresent(a -> weighSheet(n.putObject("weighSheet"), WeighSheet.of(a, batchSize)));
        }
        r.analysis().flatMap(FormulationAnalysis::curves).ifPresent(c -> curves(n.putObject("curves"), c));
        r.batch().ifPresent(b -> batch(n.putObject("batch"), b));
        ArrayNode findings = n.putArray("findings");
        r.findings().forEach(f -> findings.add(finding(f)));
        ArrayNode diagnostics = n.putArray("diagnostics");
        for (Diagnostic d : r.diagnostics()) {
            ObjectNode o = diagnostics.addObject();
            o.put("code", d.code());
            o.put("severity", d.severity().name().toLowerCase(java.util.Locale.ROOT));
            o.put("message", d.message());
            d.condition().ifPresent(c -> o.put("condition", c));
            place(o, d.pointer(), d.location());
        }
        if (!n.has("conditions")) {
            n.putArray("conditions");
            n.putArray("titrants");
        }
        return n;
    }

    private void analysis(ObjectNode n, FormulationAnalysis a) {
        Formulation f = a.recipe().formulation();
        f.title().ifPresent(t -> n.put("title", t));
        f.revision().ifPresent(t -> n.put("revision", t));
        f.intendedUse().ifPresent(t -> n.put("intendedUse", t));
        ObjectNode basis = n.putObject("basis");
        if (f.basis().finalVolume()) {
            basis.put("finalVolume", Numbers.significant(f.basis().amount(), 6));
            basis.put("unit", "L");
        } else {
            basis.put("waterMass", Numbers.significant(f.basis().amount(), 6));
            basis.put("unit", "kg");
        }
        basis.put("waterMassKg", Numbers.significant(a.solution().waterKg(), 6));
        basis.put("makeUpTemperature", Numbers.decimals(Numbers.celsius(a.recipe().makeUpKelvin()), 2));
        Systems systems = new Systems(a.recipe().library());
        ArrayNode conditions = n.putArray("conditions");
        for (ConditionResult c : a.conditions()) {
            conditions.add(condition(c, systems, !f.basis().finalVolume(), a.solution().waterKg()));
        }
        a.working().ifPresent(w -> {
            ObjectNode o = n.putObject("workingSolution");
            o.put("dilutionFactor", Numbers.significant(w.dilution().factor(), 6));
            o.put("diluent", w.dilution().diluent());
            ArrayNode cs = o.putArray("conditions");
            w.conditions().forEach(c -> cs.add(condition(c, systems, false, w.solution().waterKg())));
            ArrayNode shifts = o.putArray("pHShiftOnDilution");
            for (int i = 0; i < a.conditions().size(); i++) {
                int at = i;
                a.dilutionShift(i).ifPresent(x -> shifts.addObject()
                        .put("condition", a.conditions().get(at).condition().name())
                        .put("change", Numbers.decimals(x, 3))
                        .put("cause", "the activity coefficients' change with ionic strength"));
            }
        });
        ArrayNode titrants = n.putArray("titrants");
        for (TitrantResult t : a.titrants()) {
            titrants.add(titrant(t, f));
        }
        ArrayNode drifts = n.putArray("drifts");
        for (var d : a.drifts()) {
            ObjectNode o = drifts.addObject().put("from", d.from()).put("to", d.to())
                    .put("change", Numbers.decimals(d.change(), 3));
            d.system().ifPresent(x -> o.put("mainCause", x).put("dpKadT", Numbers.significant(d.dpKadT(), 3))
                    .put("share", Numbers.significant(d.share(), 3)));
            d.co2Change().ifPresent(x -> o.put("co2Change", x));
        }
        if (!a.proteins().isEmpty()) {
            ArrayNode ps = n.putArray("proteins");
            for (var pc : a.proteins()) {
                ObjectNode o = ps.addObject().put("name", pc.protein().name())
                        .put("molarMass", Numbers.significant(pc.protein().molarMass(), 6))
                        .put("pKaSet", pc.protein().pKaSet());
                ObjectNode g = o.putObject("groups");
                pc.protein().groups().forEach((k, v) -> g.put(k.label(), v));
                pc.isoelectricPoint().ifPresent(x -> o.put("isoelectricPoint", Numbers.decimals(x, 2)));
                ArrayNode cs = o.putArray("conditions");
                pc.conditions().stream().filter(x -> !Double.isNaN(x.netCharge())).forEach(x -> {
                    ObjectNode c = cs.addObject().put("name", x.condition())
                            .put("netCharge", Numbers.decimals(x.netCharge(), 2))
                            .put("bufferShare", Numbers.decimals(x.bufferShare(), 3));
                    x.pHShift().ifPresent(d -> c.put("pHShift", Numbers.decimals(d, 3)));
                });
            }
        }
        if (!a.drugs().isEmpty()) {
            ArrayNode ds = n.putArray("drugSubstances");
            for (var d : a.drugs()) {
                ObjectNode o = ds.addObject().put("name", d.drug().name());
                ArrayNode cs = o.putArray("conditions");
                d.conditions().forEach(x -> drugAt(cs.addObject().put("name", x.condition()), x));
                ArrayNode profile = o.putArray("profile");
                d.profile().forEach(pt -> profile.addObject().put("pH", Numbers.decimals(pt.pH(), 1))
                        .put("solubilityMmolPerLitre", Numbers.significant(pt.solubility() * 1000, 4))
                        .put("limitingSolid", pt.limiting()));
            }
        }
        if (!a.admixtures().isEmpty()) {
            ArrayNode ms = n.putArray("admixtures");
            for (var m : a.admixtures()) {
                var r = m.result();
                ObjectNode o = ms.addObject().put("into", m.fluid().name()).put("ratio", m.admixture().ratio())
                        .put("temperature", Numbers.decimals(Numbers.celsius(r.condition().kelvin()), 2));
                r.condition().co2Pascal().ifPresent(c -> o.put("co2kPa", Numbers.significant(c / 1000, 4)));
                if (r.determinate()) {
                    var st = r.state().orElseThrow();
                    o.put("pH", Numbers.decimals(st.pH(), 3));
                    r.uncertainty().ifPresent(u -> o.put("pHUncertainty", Numbers.significant(u.pH(), 2)));
                    o.put("osmolarity", Numbers.significant(r.osmolarity() * 1000, 4))
                            .put("ionicStrength", Numbers.significant(st.ionicStrength(), 4));
                } else {
                    o.put("indeterminate", r.caveats().stream().filter(c -> c.severity()
                            == org.protolyte.chemistry.Caveat.Severity.INDETERMINATE)
                            .map(org.protolyte.chemistry.Caveat::message).findFirst().orElse("no pH"));
                }
                ArrayNode ds = o.putArray("drugSubstances");
                m.drugs().forEach(d -> d.conditions().forEach(x -> drugAt(ds.addObject().put("name", d.drug().name()),
                        x)));
            }
        }
        a.titratableAcidity().ifPresent(t -> {
            ObjectNode o = n.putObject("titratableAcidity").put("mmolPerLitre", Numbers.significant(t.mmolPerLitre(), 4));
            t.mmolPerDose().ifPresent(x -> o.put("mmolPerDose", Numbers.significant(x, 4)));
        });
        a.robustness().ifPresent(r -> {
            ObjectNode o = n.putObject("robustness").put("samples", r.settings().samples()).put("seed", r.settings().seed())
                    .put("samplesSolved", r.samplesSolved());
            ArrayNode cs = o.putArray("conditions");
            r.conditions().forEach(c -> {
                ObjectNode x = cs.addObject().put("name", c.condition());
                x.putObject("pH").put("mean", Numbers.decimals(c.pH().mean(), 4)).put("p2_5", Numbers.decimals(c.pH().p025(), 4))
                        .put("p97_5", Numbers.decimals(c.pH().p975(), 4));
                c.probabilityOutsideTarget().ifPresent(p -> x.put("probabilityOutsideTarget", Numbers.significant(p, 3)));
            });
        });
        ArrayNode sens = n.putArray("targetSensitivities");
        a.targetSensitivities().forEach(x -> sens.addObject().put("substance", x.substance()).put("pointer", x.pointer())
                .put("dpHPerPercent", Numbers.significant(x.dpHPerPercent(), 3)));
        ArrayNode assumptions = n.putArray("assumptions");
        a.assumptions().forEach(assumptions::add);
    }

    private ObjectNode condition(ConditionResult c, Systems systems, boolean perKg, double waterKg) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("name", c.condition().name());
        o.put("implicit", c.condition().implicit());
        o.put("temperature", Numbers.decimals(Numbers.celsius(c.condition().kelvin()), 2));
        o.put("determinate", c.determinate());
        c.condition().co2Pascal().ifPresent(p -> o.put("co2", Numbers.significant(p / 1000, 4)));
        if (c.determinate()) {
            EquilibriumState s = c.state().orElseThrow();
            o.put("pH", Numbers.decimals(s.pH(), 3));
            c.uncertainty().ifPresent(u -> {
                o.put("pHUncertainty", Numbers.significant(u.pH(), 2));
                o.put("bufferCapacityUncertainty", Numbers.significant(u.bufferCapacityPerLitre() * 1000, 2));
                ArrayNode parts = o.putArray("uncertaintyContributions");
                u.contributions().forEach(x -> parts.addObject().put("constant", x.constant())
                        .put("standardUncertainty", x.standardUncertainty())
                        .put("pHChange", Numbers.significant(x.pHChange(), 2)));
            });
            o.put("bufferCapacity", Numbers.significant(c.bufferCapacityPerLitre() * 1000, 4));
            if (perKg) {
                o.put("bufferCapacityPerKgWater", Numbers.significant(s.bufferCapacity() * 1000, 4));
            }
            o.put("ionicStrength", Numbers.significant(s.ionicStrength(), 4));
            o.put("osmolality", Numbers.significant(s.osmolality() * 1000, 4));
            o.put("osmolarity", Numbers.significant(c.osmolarity() * 1000, 4));
            o.put("osmolalityModel", s.osmolalityModel());
            o.put("pKw", Numbers.decimals(s.pKw(), 3));
            c.pHInAir().ifPresent(x -> o.put("pHInAir", Numbers.decimals(x, 3)));
            c.co2ForTarget().ifPresent(x -> o.put("co2ForTarget", Numbers.significant(x / 1000, 3)));
            c.loads().ifPresent(l -> {
                ObjectNode lo = o.putObject("loads");
                l.acidToLeaveTarget().ifPresent(x -> lo.put("acid", Numbers.significant(x, 3)));
                l.baseToLeaveTarget().ifPresent(x -> lo.put("base", Numbers.significant(x, 3)));
            });
            ArrayNode species = o.putArray("species");
            for (SpeciesAmount sp : s.species()) {
                if (!systems.isSystem(sp.component())) {
                    continue;
                }
                ObjectNode x = species.addObject();
                x.put("system", systems.of(sp.component()));
                x.put("name", sp.species().name());
                x.put("charge", sp.species().charge());
                x.put("molality", Numbers.significant(sp.molality(), 4));
                x.put("fraction", Numbers.significant(sp.fractionOfComponent(), 4));
            }
            ArrayNode complexes = o.putArray("complexes");
            var totals = Complexes.totals(s);
            for (SpeciesAmount sp : s.species()) {
                if (sp.species().isComplex()) {
                    ObjectNode x = complexes.addObject();
                    x.put("name", sp.species().name());
                    x.put("charge", sp.species().charge());
                    x.put("molality", Numbers.significant(sp.molality(), 4));
                    ObjectNode bound = x.putObject("share");
                    Complexes.shares(totals, sp).forEach((k, v) -> bound.put(k.name(), Numbers.significant(v, 4)));
                }
            }
            ArrayNode solids = o.putArray("solids");
            for (SolidPhase.Saturation x : c.saturation()) {
                solids.addObject().put("phase", x.phase().name()).put("formula", x.phase().formula())
                        .put("saturationIndex", Numbers.decimals(x.index(), 3))
                        .put("log10IonActivityProduct", Numbers.decimals(x.log10Iap(), 3))
                        .put("log10Ksp", Numbers.decimals(x.log10Ksp(), 3))
                        .put("kspExtrapolated", !x.inRange());
            }
        } else {
            o.putNull("pH");
            o.putNull("bufferCapacity");
            o.putNull("ionicStrength");
            o.putArray("species");
        }
        return o;
    }

    private ObjectNode titrant(TitrantResult t, Formulation f) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("substance", t.ingredient().substance().name());
        o.put("pointer", t.ingredient().line().pointer());
        o.put("role", t.role() == TitrantResult.Role.ACID ? "acid" : "base");
        o.put("used", t.used() && t.unreachable().isEmpty());
        o.put("amount", Numbers.significant(t.moles() * 1000, 5));
        o.put("amountUnit", f.basis().finalVolume() ? "mmol per " + Numbers.significant(f.basis().amount(), 6)
                + " L of solution" : "mmol per " + Numbers.significant(f.basis().amount(), 6) + " kg of water");
        t.stockMillilitres().ifPresent(ml -> o.put("stockVolume", Numbers.significant(ml, 4)));
        ObjectNode goal = o.putObject("goal");
        goal.put("pH", Numbers.decimals(t.goalPH(), 3));
        goal.put("temperature", Numbers.decimals(Numbers.celsius(t.goalKelvin()), 2));
        if (t.setpointPH().isPresent()) {
            ObjectNode sp = o.putObject("setpoint");
            sp.put("pH", Numbers.decimals(t.setpointPH().getAsDouble(), 2));
            sp.put("temperature", Numbers.decimals(Numbers.celsius(t.adjustKelvin()), 2));
            sp.put("atVolume", Numbers.significant(t.atVolume(), 4));
        }
        t.pHAfterMakingUp().ifPresent(x -> o.put("pHAfterMakingUp", Numbers.decimals(x, 3)));
        t.setpointForTarget().ifPresent(x -> o.put("setpointForTarget", Numbers.decimals(x, 2)));
        t.unreachable().ifPresent(u -> {
            o.put("unreachable", u.reason());
            o.put("reachablePH", Numbers.decimals(u.reachablePH(), 2));
        });
        return o;
    }

    private static void weighSheet(ObjectNode o, WeighSheet w) {
        o.put("basis", w.basis());
        w.batch().ifPresent(b -> o.putObject("batch").put("size", b.size()).put("factor", Numbers.significant(b.factor(), 6)));
        ArrayNode lines = o.putArray("lines");
        for (WeighSheet.Line l : w.lines()) {
            ObjectNode x = lines.addObject().put("pointer", l.pointer()).put("substance", l.substance())
                    .put("recorded", l.recorded());
            l.stock().ifPresent(s -> x.put("stock", s));
            l.mmol().ifPresent(v -> x.put("mmol", v));
            l.grams().ifPresent(v -> x.put("grams", v));
            l.stockMillilitres().ifPresent(v -> x.put("stockMillilitres", v));
            l.batchMmol().ifPresent(v -> x.put("batchMmol", v));
            l.batchGrams().ifPresent(v -> x.put("batchGrams", v));
            l.batchStockMillilitres().ifPresent(v -> x.put("batchStockMillilitres", v));
        }
        ArrayNode notes = o.putArray("notes");
        w.notes().forEach(notes::add);
    }

    /** The points behind each plot, named as the HTML report's plots are. */
    private static void curves(ObjectNode o, org.protolyte.analysis.Curves c) {
        ObjectNode t = o.putObject("titration").put("temperature", Numbers.decimals(Numbers.celsius(c.titrationKelvin()), 2));
        c.qsAdded().ifPresent(x -> t.put("qsAdded", Numbers.significant(x, 5)));
        c.qsPH().ifPresent(x -> t.put("qsPH", Numbers.decimals(x, 3)));
        ArrayNode tp = t.putArray("points");
        ObjectNode cap = o.putObject("capacity");
        ArrayNode cp = cap.putArray("points");
        ObjectNode sp = o.putObject("speciation");
        ArrayNode forms = sp.putArray("forms");
        c.forms().forEach(forms::add);
        ArrayNode spp = sp.putArray("points");
        for (var p : c.titration()) {
            tp.addObject().put("added", Numbers.significant(p.added(), 5)).put("pH", Numbers.decimals(p.pH(), 3));
            cp.addObject().put("pH", Numbers.decimals(p.pH(), 3)).put("bufferCapacity", Numbers.significant(p.bufferCapacity(), 4));
            ArrayNode f = spp.addObject().put("pH", Numbers.decimals(p.pH(), 3)).putArray("fractions");
            p.fractions().forEach(x -> f.add(Numbers.decimals(x, 4)));
        }
        if (c.forms().isEmpty()) {
            o.remove("speciation");
        }
        ObjectNode temp = o.putObject("temperature");
        if (Double.isFinite(c.validToKelvin())) {
            temp.putObject("constantsRange").put("from", Numbers.decimals(Numbers.celsius(c.validFromKelvin()), 1))
                    .put("to", Numbers.decimals(Numbers.celsius(c.validToKelvin()), 1));
        }
        ArrayNode pts = temp.putArray("points");
        for (var p : c.temperature()) {
            ObjectNode x = pts.addObject().put("temperature", Numbers.decimals(Numbers.celsius(p.kelvin()), 2));
            if (Double.isNaN(p.pH())) {
                x.putNull("pH");
            } else {
                x.put("pH", Numbers.decimals(p.pH(), 3));
            }
        }
        if (!c.solids().isEmpty()) {
            ObjectNode sat = o.putObject("saturation");
            ArrayNode names = sat.putArray("solids");
            c.solids().forEach(names::add);
            ArrayNode sps = sat.putArray("points");
            for (var p : c.temperature()) {
                ArrayNode si = sps.addObject().put("temperature", Numbers.decimals(Numbers.celsius(p.kelvin()), 2))
                        .putArray("saturationIndex");
                p.saturationIndex().forEach(x -> {
                    if (Double.isNaN(x)) {
                        si.addNull();
                    } else {
                        si.add(Numbers.decimals(x, 3));
                    }
                });
            }
        }
    }

    private ObjectNode finding(Finding f) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("rule", f.rule());
        o.put("severity", f.severity().code());
        o.put("message", f.message());
        place(o, f.pointer(), f.location());
        f.definition().ifPresent(d -> {
            o.put("summary", d.summary());
            o.put("explanation", d.explanation());
            d.remedy().ifPresent(x -> o.put("remedy", x));
            d.safety().ifPresent(x -> o.put("safety", x));
            ArrayNode refs = o.putArray("references");
            d.references().forEach(refs::add);
            o.put("pack", d.pack());
        });
        f.waivedBy().ifPresent(w -> {
            ObjectNode x = o.putObject("waived");
            x.put("reason", w.reason());
            x.put("approver", w.approver());
            x.put("approved", w.approved().toString());
            x.put("expires", w.expires().toString());
            x.put("grantedIn", w.origin());
            x.put("authorGranted", w.authorGranted());
        });
        return o;
    }

    private static void place(ObjectNode o, Optional<String> pointer, Optional<Location> location) {
        pointer.ifPresent(p -> o.put("pointer", p));
        location.ifPresent(l -> {
            o.put("line", l.line());
            o.put("column", l.column());
        });
    }
}
