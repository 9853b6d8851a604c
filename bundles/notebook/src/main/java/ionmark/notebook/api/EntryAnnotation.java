package ionmark.notebook.api;

import org.osgi.annotation.versioning.ProviderType;

import ionmark.host.api.Entry;

/** The notebook's reading of an entry. Thread-safe; never throws for odd entries, it reports them. */
@ProviderType
public interface EntryAnnotation {
    AnnotatedEntry annotate(Entry entry);
}
