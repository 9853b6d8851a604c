package ionmark.notebook.internal;

import ionmark.host.templates.PageTemplates;

/**
 * The notebook's HTML: every page, card and fragment comes from a jte template in {@code src/main/jte}, compiled
 * into this package at build time and escaped by context; there is no hand-written escaping left.
 */
final class Html {
    /** The notebook's templates. */
    static final PageTemplates TEMPLATES = PageTemplates.beside(Html.class);

    private Html() {
    }
}
