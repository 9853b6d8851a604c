package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicReference;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.component.annotations.ReferencePolicyOption;

import ionmark.acidity.api.TableService;
import ionmark.host.api.Decoration;
import ionmark.host.api.Entry;
import ionmark.host.api.EntryDecorator;
import ionmark.host.api.HostUser;
import ionmark.notebook.api.AnnotatedEntry;
import ionmark.notebook.api.AnnotatedStructure;
import ionmark.notebook.api.EntryAnnotation;
import ionmark.notebook.api.Separation;
import ionmark.speciation.api.Speciation;
import ionmark.store.api.TableStore;

/**
 * Annotates every structure of an entry ({@link EntryReader}, the path {@code ionmark annotate} shares) and
 * renders a card after the block each came from, plus, for an entry with several structures, the pH ranges
 * that separate them.
 */
@Component(service = {EntryDecorator.class, EntryAnnotation.class})
public final class Annotator implements EntryDecorator, EntryAnnotation {
    private final Speciation speciation;
    private final AtomicReference<TableStore> store = new AtomicReference<>();
    private final AtomicReference<TableService> tables = new AtomicReference<>();
    private final AtomicReference<SeenEntries> seen = new AtomicReference<>();
    private final CardCache cards = new CardCache(CardCache.DEFAULT_CHARS);

    /** Without a table store: pinned entries are annotated with the current table, and their cards say so. */
    @Activate
    public Annotator(@Reference Speciation speciation) {
        this.speciation = speciation;
    }

    /** With a table store, an entry pinned to a table version ("Table version: v3") is annotated with that version. */
    public Annotator(Speciation speciation, TableStore store, TableService tables) {
        this(speciation);
        this.store.set(store);
        this.tables.set(tables);
    }

    // Dynamic and greedy: a store that starts after this component is still used (a static reluctant optional
    // reference stayed unbound, and pinned entries silently showed the head), without taking the cards away
    // while the component is rebuilt.
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC,
            policyOption = ReferencePolicyOption.GREEDY)
    void setStore(TableStore s) {
        store.set(s);
    }

    void unsetStore(TableStore s) {
        store.compareAndSet(s, null);
    }

    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC,
            policyOption = ReferencePolicyOption.GREEDY)
    void setTables(TableService t) {
        tables.set(t);
    }

    void unsetTables(TableService t) {
        tables.compareAndSet(t, null);
    }

    /** The entries this notebook has annotated: what the table admin's report of affected entries covers. */
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC,
            policyOption = ReferencePolicyOption.GREEDY)
    void setSeen(SeenEntries s) {
        seen.set(s);
    }

    void unsetSeen(SeenEntries s) {
        seen.compareAndSet(s, null);
    }

    /** The speciation for an entry and what the reader must know about the table it uses. */
    record Bound(Speciation speciation, List<String> warnings) {
    }

    Bound forEntry(Entry entry) {
        int v = entry.pinnedTableVersion();
        if (v <= 0) {
            return new Bound(speciation, List.of());
        }
        TableStore store = this.store.get();
        TableService tables = this.tables.get();
        if (store == null || tables == null) {
            return new Bound(speciation, List.of("This entry is pinned to table v" + v + ", but no table store is "
                    + "available: annotated with the current table instead."));
        }
        var json = store.content(v);
        if (json.isEmpty()) {
            return new Bound(speciation, List.of("This entry is pinned to table v" + v + ", which the table store does "
                    + "not hold: annotated with the current table instead. Correct the 'Table version:' line."));
        }
        var table = tables.validate(json.get()).table();
        if (table.isEmpty()) {
            return new Bound(speciation, List.of("Table v" + v + " in the store does not validate: annotated with the "
                    + "current table instead."));
        }
        return new Bound(speciation.pinned(table.get()), List.of());
    }

    @Override
    public AnnotatedEntry annotate(Entry entry) {
        Bound b = forEntry(entry);
        return new EntryReader(b.speciation()).read(entry, b.warnings());
    }

    @Override
    public List<Decoration> decorate(Entry entry, HostUser user) {
        SeenEntries known = seen.get();
        if (known != null) {
            known.record(entry);
        }
        AnnotatedEntry a = annotate(entry);
        List<Decoration> out = new ArrayList<>();
        List<String> own = a.warnings().stream().filter(w -> !entry.notices().contains(w)).toList();
        if (!own.isEmpty()) {
            out.add(new Decoration(0, Html.TEMPLATES.render("entryWarnings", "warnings", own).strip()));
        }
        for (AnnotatedStructure s : a.structures()) {
            out.add(new Decoration(s.block(), card(s)));
        }
        long distinct = a.structures().stream().filter(AnnotatedStructure::ok).map(AnnotatedStructure::words).distinct()
                .count();
        if (distinct >= 2) {
            out.add(new Decoration(entry.blocks().size() - 1, separations(a.separations())));
        }
        return out;
    }

    /** The card of one structure, drawn once per distinct content ({@link CardCache}). */
    String card(AnnotatedStructure s) {
        return cards.html(s, x -> new Card(x).html());
    }

    /** The rendered-card cache (tests). */
    CardCache cards() {
        return cards;
    }

    static String separations(List<Separation> found) {
        return Html.TEMPLATES.render("separations", "found", found).strip();
    }

    /** A separating range as the table shows it. */
    static String range(Separation s) {
        return String.format(Locale.ROOT, "%.1f–%.1f", s.from(), s.to());
    }
}
