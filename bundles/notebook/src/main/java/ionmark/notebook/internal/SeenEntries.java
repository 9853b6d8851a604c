package ionmark.notebook.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.osgi.service.component.annotations.Component;

import ionmark.host.api.Entry;

/**
 * The entries the host has asked this bundle to annotate, latest content per entry id. The host
 * contract hands entries to decorators one at a time and has no listing, so this is the workspace
 * as the notebook has seen it since it started: what the table admin's report of affected entries
 * covers. Bounded, so a host with very many entries keeps memory in check.
 */
@Component(service = SeenEntries.class, immediate = true) // immediate: a delayed one is disposed, with what it saw, whenever its users rebind
public final class SeenEntries {
    static final int LIMIT = 5_000;
    private final Map<String, Entry> entries = new ConcurrentHashMap<>();

    public void record(Entry e) {
        if (entries.size() < LIMIT || entries.containsKey(e.id())) {
            entries.put(e.id(), e);
        }
    }

    public List<Entry> all() {
        List<Entry> out = new ArrayList<>(entries.values());
        out.sort(java.util.Comparator.comparing(Entry::id));
        return out;
    }
}
