package ionmark.speciation.internal;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.osgi.service.component.annotations.Component;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.MeasuredCompound;
import ionmark.acidity.api.Reference;
import ionmark.acidity.api.TableVersion;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Site;
import ionmark.speciation.internal.estimate.Overrides;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.internal.structure.StructureReader;
import ionmark.speciation.measured.MeasuredImport;

/** Bulk import of measured values ({@link MeasuredImport}): rows checked against the head, a draft made of the valid ones. */
@Component(service = MeasuredImport.class)
public final class MeasuredImportService implements MeasuredImport {
    /** Reported macroscopic constants outside this range are not observable in water. */
    static final double LOW = -2;
    static final double HIGH = 16;
    /** A value this far from every predicted constant is shown as a note: a typo or a misassigned step. */
    static final double FAR = 3;
    private static final int MAX_HEAVY_ATOMS = 300;

    @Override
    public Result read(String text, Format format, AcidityTable head, String author) {
        Engine engine = new Engine(head, MAX_HEAVY_ATOMS);
        List<MeasuredRecords.Record> records = format == Format.SDF ? MeasuredRecords.sdf(text) : MeasuredRecords.tsv(text);
        Set<String> ids = new HashSet<>();
        head.measured().forEach(m -> ids.add(m.id()));
        Set<String> refIds = new HashSet<>();
        head.references().forEach(r -> refIds.add(r.id()));
        Map<String, Reference> newRefs = new java.util.LinkedHashMap<>();
        Map<String, Integer> structures = new HashMap<>();
        List<Row> rows = new ArrayList<>();
        for (MeasuredRecords.Record rec : records) {
            rows.add(row(engine, rec, ids, refIds, newRefs, structures));
        }
        List<MeasuredCompound> measured = new ArrayList<>(head.measured());
        rows.stream().filter(Row::ok).forEach(r -> measured.add(r.compound()));
        List<Reference> refs = new ArrayList<>(head.references());
        Set<String> used = new HashSet<>();
        rows.stream().filter(Row::ok).forEach(r -> used.add(r.compound().source()));
        List<Reference> added = newRefs.values().stream().filter(r -> used.contains(r.id())).toList();
        refs.addAll(added);
        long n = rows.stream().filter(Row::ok).count();
        TableVersion v = new TableVersion(head.version().number() + 1, author, Instant.now().toString(),
                n + " measured compound" + (n == 1 ? "" : "s") + " imported", "", head.version().number());
        // the head with the new measured compounds and references, everything else as it was (the fit provenance
        // too: without it every derivation of the draft lost its calibration lines)
        AcidityTable draft = head.withMeasured(measured).withReferences(refs).withVersion(v);
        return new Result(rows, added, draft);
    }

    private Row row(Engine engine, MeasuredRecords.Record rec, Set<String> ids, Set<String> refIds,
            Map<String, Reference> newRefs, Map<String, Integer> structures) {
        List<String> problems = new ArrayList<>(rec.problems());
        List<String> notes = new ArrayList<>();
        Map<String, String> f = rec.fields();
        String id = f.getOrDefault("id", "").strip();
        if (id.isEmpty()) {
            problems.add("no id");
        } else if (!id.matches("[A-Za-z0-9][A-Za-z0-9._-]*")) {
            problems.add("id '" + id + "' may hold only letters, digits, '.', '_' and '-'");
        } else if (!ids.add(id)) {
            problems.add("id '" + id + "' is already used (in the table or an earlier row)");
        }
        List<Double> pka = new ArrayList<>();
        String values = f.getOrDefault("pka_values", "").strip();
        if (values.isEmpty()) {
            problems.add("no pKa values");
        }
        for (String x : values.isEmpty() ? new String[0] : values.split(";")) {
            try {
                double d = Double.parseDouble(x.strip());
                if (d < LOW || d > HIGH) {
                    problems.add(String.format(Locale.ROOT, "pKa %s is outside %.0f to %.0f, where constants in water "
                            + "can be measured", x.strip(), LOW, HIGH));
                }
                if (!pka.isEmpty() && d <= pka.get(pka.size() - 1)) {
                    problems.add("pKa values must be listed in ascending order: " + values);
                }
                pka.add(d);
            } catch (NumberFormatException e) {
                problems.add("pKa value '" + x.strip() + "' is not a number");
            }
        }
        double t = number(f, "temperature", 25, 0, 100, "temperature (°C)", problems);
        double ionic = number(f, "ionic_strength", 0, 0, 5, "ionic strength (mol/L)", problems);
        String source = f.getOrDefault("source", "").strip();
        if (source.isEmpty()) {
            problems.add("no source: name the reference id or give the citation");
        } else if (!refIds.contains(source)) {
            Reference r = newRefs.computeIfAbsent(source, s -> new Reference("measured-" + digest(s).substring(0, 10), s));
            notes.add("new reference " + r.id() + ": " + source);
            source = r.id();
        }
        // a molfile keeps its first (title) line, blank or not
        String structure = rec.molfile() ? f.getOrDefault("smiles", "") : f.getOrDefault("smiles", "").strip();
        List<String> groups = new ArrayList<>();
        List<Double> predicted = List.of();
        if (structure.isBlank()) {
            problems.add("no structure");
        } else {
            Analysis a = engine.analyse(structure, Conditions.noPh(), true);
            if (!a.ok()) {
                problems.add("structure not readable: " + a.error());
            } else {
                predicted = a.macroPka();
                List<Site> sites = a.sites().stream().filter(s -> !s.permanent())
                        .sorted(java.util.Comparator.comparingDouble(Site::pka)).toList();
                if (sites.stream().anyMatch(s -> s.basis() == ionmark.speciation.api.Basis.MEASURED)) {
                    problems.add("this structure is already a measured compound of the table");
                } else if (sites.size() < pka.size()) {
                    problems.add(pka.size() + " values but " + sites.size() + " titratable site"
                            + (sites.size() == 1 ? "" : "s") + " perceived " + sites.stream().map(Site::group).toList()
                            + ": a value cannot be given to a site");
                } else if (!pka.isEmpty()) {
                    groups.addAll(assign(sites, pka));
                    for (double v : pka) {
                        if (predicted.stream().noneMatch(p -> Math.abs(p - v) <= FAR)) {
                            notes.add(String.format(Locale.ROOT, "pKa %.2f is more than %.0f units from every predicted "
                                    + "constant %s: check the value and the structure", v, FAR, predicted));
                        }
                    }
                }
                try {
                    var prep = new StructureReader(MAX_HEAVY_ATOMS).read(structure);
                    String key = Overrides.canonical(prep.molecule());
                    Integer earlier = structures.putIfAbsent(key, rec.line());
                    if (earlier != null && !key.isEmpty()) {
                        problems.add("the same structure as row " + earlier);
                    }
                    if (rec.molfile()) {
                        structure = prep.smilesAsRead(); // the table holds SMILES
                    }
                } catch (StructureException e) {
                    problems.add("structure not readable: " + e.getMessage());
                }
            }
        }
        if (!problems.isEmpty()) {
            return new Row(rec.line(), null, groups, predicted, problems, notes);
        }
        String name = f.getOrDefault("name", "").strip();
        MeasuredCompound m = new MeasuredCompound(id, name.isEmpty() ? id : name, structure, pka, t, ionic,
                f.getOrDefault("method", "").strip(), source, groups);
        return new Row(rec.line(), m, groups, predicted, problems, notes);
    }

    /** The classes of the k sites (by estimate, ascending) nearest the k values, in a contiguous window. */
    private static List<String> assign(List<Site> sites, List<Double> pka) {
        int k = pka.size();
        int best = 0;
        double cost = Double.MAX_VALUE;
        for (int s = 0; s + k <= sites.size(); s++) {
            double c = 0;
            for (int i = 0; i < k; i++) {
                c += Math.abs(sites.get(s + i).pka() - pka.get(i));
            }
            if (c < cost) {
                cost = c;
                best = s;
            }
        }
        return sites.subList(best, best + k).stream().map(Site::group).toList();
    }

    private static double number(Map<String, String> f, String key, double fallback, double low, double high,
            String what, List<String> problems) {
        String v = f.getOrDefault(key, "").strip();
        if (v.isEmpty()) {
            return fallback;
        }
        try {
            double d = Double.parseDouble(v);
            if (d < low || d > high) {
                problems.add(String.format(Locale.ROOT, "%s %s is outside %.0f to %.0f", what, v, low, high));
            }
            return d;
        } catch (NumberFormatException e) {
            problems.add(what + " '" + v + "' is not a number");
            return fallback;
        }
    }

    @Override
    public List<Move> analogMoves(AcidityTable head, AcidityTable draft, List<String> structures) {
        return AnalogMoves.of(head, draft, structures, MAX_HEAVY_ATOMS);
    }

    static String digest(String s) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(s.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
