package ionmark.host.internal;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import ionmark.host.api.Block;
import ionmark.host.api.Entry;
import ionmark.host.api.SidePanel;
import ionmark.host.templates.PageTemplates;
import gg.jte.Content;

/**
 * The web shell's frame, sign-in and entry pages, rendered through the templates in {@code src/main/jte}: entry
 * text is escaped by the template engine; contributed HTML (cards, panels, admin pages) is placed as is.
 */
final class Pages {
    /** The shell's templates, precompiled into this package ({@code src/main/jte}). */
    static final PageTemplates TEMPLATES = PageTemplates.beside(Pages.class);

    private Pages() {
    }

    /** What an entry block shows as. */
    enum Kind { H1, H2, TEXT, TABLE, STRUCTURE, STRUCTURE_BLOCK }

    /**
     * One block of an entry as the page shows it.
     *
     * @param text        the heading, paragraph, table or structure text (structure: with its stated pH)
     * @param detail      a molfile or RXN block's whole text under its title line, else empty
     * @param decorations contributed HTML placed after the block
     */
    record Part(Kind kind, String text, String detail, List<String> decorations) {
    }

    static String page(String title, String body) {
        return page(title, body, null);
    }

    /** @param signedIn the signed-in user's name, or null */
    static String page(String title, String body, String signedIn) {
        Map<String, Object> p = new HashMap<>();
        p.put("title", title);
        p.put("signedIn", signedIn);
        p.put("body", (Content) out -> out.writeContent(body));
        return TEMPLATES.render("page", p);
    }

    static String signIn(String token, String message) {
        return TEMPLATES.render("signIn", Map.of("token", token, "message", message));
    }

    static String entry(Entry e, Map<Integer, List<String>> decorations, List<SidePanel> panels) {
        return TEMPLATES.render("entry", Map.of("id", e.id(), "parts", parts(e, decorations)));
    }

    static String body(Entry e, Map<Integer, List<String>> decorations) {
        return TEMPLATES.render("body", Map.of("parts", parts(e, decorations)));
    }

    /** The entry's blocks as parts: headings, paragraphs, tables; a molfile or RXN block folded under its title. */
    static List<Part> parts(Entry e, Map<Integer, List<String>> decorations) {
        List<Part> parts = new ArrayList<>();
        List<Block> blocks = e.blocks();
        for (int i = 0; i < blocks.size(); i++) {
            Block b = blocks.get(i);
            List<String> d = decorations.getOrDefault(i, List.of());
            String c = b.content();
            parts.add(switch (b.kind()) {
                case STRUCTURE -> structure(b, d);
                case TABLE -> new Part(Kind.TABLE, c, "", d);
                default -> c.startsWith("# ") ? new Part(Kind.H1, c.substring(2), "", d)
                        : c.startsWith("#") ? new Part(Kind.H2, c.replaceFirst("^#+\\s*", ""), "", d)
                        : new Part(Kind.TEXT, c, "", d);
            });
        }
        return parts;
    }

    /** A structure block: SMILES as written; a molfile or RXN block folded under its title line. */
    private static Part structure(Block b, List<String> decorations) {
        String c = b.content().strip();
        String ph = b.ph() == null ? "" : "  [pH " + b.ph() + "]";
        if (c.contains("\n")) {
            String title = b.content().lines().findFirst().orElse("").strip();
            return new Part(Kind.STRUCTURE_BLOCK, (title.isEmpty() ? "structure block" : title) + ph, b.content(),
                    decorations);
        }
        return new Part(Kind.STRUCTURE, c + ph, "", decorations);
    }

    /** The editor with its live preview beside it (stacked on narrow screens). */
    static String editor(String id, String text, String token) {
        return TEMPLATES.render("editor", Map.of("id", id, "text", text, "token", token));
    }

    /** A side panel's or administration page's title over the HTML its bundle built. */
    static String contributed(String title, String html) {
        return TEMPLATES.render("contributed", Map.of("title", title, "html", html));
    }

    /** The line shown where a contributor's annotations failed. */
    static String annotationsFailed(String message) {
        return TEMPLATES.render("annotationsFailed", Map.of("message", message));
    }
}
