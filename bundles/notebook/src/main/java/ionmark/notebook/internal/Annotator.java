package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

import ionmark.host.api.Block;
import ionmark.host.api.Decoration;
import ionmark.host.api.Entry;
import ionmark.host.api.EntryDecorator;
import ionmark.host.api.HostUser;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;
import ionmark.speciation.api.Speciation;

/**
 * Annotates every structure of an entry (structure blocks, and SMILES written inline in text where
 * unambiguous) at the pH the entry states for it: the block's own pH, else the nearest statement
 * before it in the same section (for inline SMILES: up to the end of its own paragraph), else the
 * entry's first statement.
 * Temperature and ionic strength are found the same way.
 */
@Component(service = EntryDecorator.class)
public final class Annotator implements EntryDecorator {
    private final Speciation speciation;
    private final ionmark.store.api.TableStore store;
    private final ionmark.acidity.api.TableService tables;
    private final SeenEntries seen;

    public Annotator(Speciation speciation) {
        this(speciation, null, null);
    }

    public Annotator(Speciation speciation, ionmark.store.api.TableStore store, ionmark.acidity.api.TableService tables) {
        this(speciation, store, tables, null);
    }

    /** With a table store, an entry pinned to a table version ("Table version: v3") is annotated with that version. */
    @Activate
    public Annotator(@Reference Speciation speciation,
            @Reference(cardinality = org.osgi.service.component.annotations.ReferenceCardinality.OPTIONAL)
            ionmark.store.api.TableStore store,
            @Reference(cardinality = org.osgi.service.component.annotations.ReferenceCardinality.OPTIONAL)
            ionmark.acidity.api.TableService tables,
            @Reference SeenEntries seen) { // mandatory: an optional static reference can stay unbound for good
        this.speciation = speciation;
        this.store = store;
        this.tables = tables;
        this.seen = seen;
    }

    /** The speciation for an entry: bound to its pinned table version when it names one the store holds. */
    Speciation forEntry(Entry entry) {
        if (entry.pinnedTableVersion() <= 0 || store == null || tables == null) {
            return speciation;
        }
        return store.content(entry.pinnedTableVersion()).flatMap(json -> tables.validate(json).table())
                .map(speciation::pinned).orElse(speciation);
    }

    /** A statement found in a text block. */
    record Found<T>(int block, int section, T value) {
    }

    /** A structure of an entry with the conditions the entry states for it. */
    record Stated(int block, String structure, List<Double> ph, double temperature, double ionicStrength,
            List<String> taken) {
        Stated at(int b) {
            return new Stated(b, structure, ph, temperature, ionicStrength, taken);
        }
    }

    /** Every structure of an entry (blocks and inline SMILES) with its stated conditions (the table report's input). */
    List<Stated> stated(Entry entry) {
        List<Found<StatedConditions.PhStatement>> phs = new ArrayList<>();
        List<Found<StatedConditions.Value>> temps = new ArrayList<>();
        List<Found<StatedConditions.Value>> ionic = new ArrayList<>();
        scan(entry.blocks(), phs, temps, ionic);
        List<Stated> out = new ArrayList<>();
        List<Block> blocks = entry.blocks();
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            if (b.kind() == Block.Kind.TEXT) {
                for (String smi : InlineStructures.find(b.content())) {
                    out.add(stated(new Block(Block.Kind.STRUCTURE, smi, null, b.section()), i + 1, phs, temps, ionic)
                            .at(i));
                }
            } else if (b.kind() == Block.Kind.STRUCTURE && !b.content().isBlank()) {
                out.add(stated(b, i, phs, temps, ionic).at(i));
            }
        }
        return out;
    }

    private static void scan(List<Block> blocks, List<Found<StatedConditions.PhStatement>> phs,
            List<Found<StatedConditions.Value>> temps, List<Found<StatedConditions.Value>> ionic) {
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            if (b.kind() != Block.Kind.STRUCTURE) {
                int k = i;
                StatedConditions.ph(b.content()).forEach(p -> phs.add(new Found<>(k, b.section(), p)));
                StatedConditions.temperature(b.content()).forEach(p -> temps.add(new Found<>(k, b.section(), p)));
                StatedConditions.ionicStrength(b.content()).forEach(p -> ionic.add(new Found<>(k, b.section(), p)));
            }
        }
    }

    @Override
    public List<Decoration> decorate(Entry entry, HostUser user) {
        if (seen != null) {
            seen.record(entry);
        }
        Speciation sp = forEntry(entry);
        List<Found<StatedConditions.PhStatement>> phs = new ArrayList<>();
        List<Found<StatedConditions.Value>> temps = new ArrayList<>();
        List<Found<StatedConditions.Value>> ionic = new ArrayList<>();
        List<Block> blocks = entry.blocks();
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            if (b.kind() != Block.Kind.STRUCTURE) {
                int k = i;
                StatedConditions.ph(b.content()).forEach(p -> phs.add(new Found<>(k, b.section(), p)));
                StatedConditions.temperature(b.content()).forEach(p -> temps.add(new Found<>(k, b.section(), p)));
                StatedConditions.ionicStrength(b.content()).forEach(p -> ionic.add(new Found<>(k, b.section(), p)));
            }
        }
        List<Decoration> out = new ArrayList<>();
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            if (b.kind() == Block.Kind.TEXT) {
                // SMILES written inline in the text: annotated after the paragraph, at the pH that applies there
                for (String smi : InlineStructures.find(b.content())) {
                    Block inline = new Block(Block.Kind.STRUCTURE, smi, null, b.section());
                    out.add(new Decoration(i, card(sp, inline, i + 1, phs, temps, ionic).html()));
                }
                continue;
            }
            if (b.kind() != Block.Kind.STRUCTURE || b.content().isBlank()) {
                continue;
            }
            out.add(new Decoration(i, card(sp, b, i, phs, temps, ionic).html()));
        }
        return out;
    }

    Card card(Speciation sp, Block b, int index, List<Found<StatedConditions.PhStatement>> phs,
            List<Found<StatedConditions.Value>> temps, List<Found<StatedConditions.Value>> ionic) {
        Stated s = stated(b, index, phs, temps, ionic);
        return check(sp, s.structure(), s.ph(), s.temperature(), s.ionicStrength(), s.taken());
    }

    private static Stated stated(Block b, int index, List<Found<StatedConditions.PhStatement>> phs,
            List<Found<StatedConditions.Value>> temps, List<Found<StatedConditions.Value>> ionic) {
        List<String> taken = new ArrayList<>();
        double t = Conditions.STANDARD_TEMPERATURE;
        Found<StatedConditions.Value> ft = nearest(temps, index, b.section());
        if (ft != null) {
            t = ft.value().value();
            taken.add(ft.value().words());
        }
        double is = 0;
        Found<StatedConditions.Value> fi = nearest(ionic, index, b.section());
        if (fi != null) {
            is = fi.value().value();
            taken.add(fi.value().words());
        }
        List<Double> phValues = new ArrayList<>();
        if (b.ph() != null) {
            phValues.add(b.ph());
            taken.add(0, "pH " + StatedConditions.format(b.ph()) + " (on the structure block)");
        } else {
            Found<StatedConditions.PhStatement> f = nearest(phs, index, b.section());
            if (f != null) {
                phValues.add(f.value().low());
                if (f.value().isRange()) {
                    phValues.add(f.value().high());
                }
                taken.add(0, f.value().words());
            }
        }
        return new Stated(index, b.content(), phValues, t, is, taken);
    }

    Card check(String structure, List<Double> phValues, double t, double is, List<String> taken) {
        return check(speciation, structure, phValues, t, is, taken);
    }

    Card check(Speciation speciation, String structure, List<Double> phValues, double t, double is,
            List<String> taken) {
        List<Analysis> analyses = new ArrayList<>();
        if (phValues.isEmpty()) {
            analyses.add(speciation.analyse(structure, new Conditions(null, t, is)));
        } else {
            for (double ph : phValues) {
                analyses.add(speciation.analyse(structure, new Conditions(ph, t, is)));
            }
        }
        Curve curve = null;
        if (analyses.get(0).ok()) {
            try {
                curve = speciation.curve(structure, new Conditions(null, t, is), 0, 14, 0.1);
            } catch (IllegalArgumentException e) {
                curve = null;
            }
        }
        return new Card(analyses, taken, curve);
    }

    /** The nearest statement before the block in its section, else the first in the entry. */
    static <T> Found<T> nearest(List<Found<T>> found, int block, int section) {
        Found<T> best = null;
        for (Found<T> f : found) {
            if (f.block() < block && f.section() == section) {
                best = f;
            }
        }
        return best != null ? best : found.isEmpty() ? null : found.get(0);
    }
}
