package ionmark.host.templates;

import java.util.Map;
import java.util.Objects;

import gg.jte.ContentType;
import gg.jte.TemplateEngine;
import gg.jte.output.StringOutput;

/**
 * A bundle's precompiled page templates, rendered as HTML with contextual escaping: every {@code ${...}} is escaped
 * for where it stands (text, quoted attribute value); only {@code $unsafe{...}} places HTML as it is. The
 * templates ({@code src/main/jte/*.jte}) are compiled to Java classes by jte's Maven plugin at build time, into
 * one package of the bundle that uses them; there is no template compiler at run time.
 *
 * <pre>{@code
 * static final PageTemplates TEMPLATES = PageTemplates.beside(Card.class);   // classes in Card's package
 * String html = TEMPLATES.render("card", Map.of("card", view));              // renders card.jte
 * }</pre>
 */
public final class PageTemplates {
    private final TemplateEngine engine;

    private PageTemplates(TemplateEngine engine) {
        this.engine = engine;
    }

    /**
     * The templates precompiled into {@code anchor}'s package, loaded by {@code anchor}'s class loader. jte takes
     * the loader of precompiled classes from the thread's context class loader when the engine is made (the one it
     * is given is ignored), and in OSGi that loader does not see the calling bundle: so it is set to
     * {@code anchor}'s for the moment of creation.
     */
    public static PageTemplates beside(Class<?> anchor) {
        Objects.requireNonNull(anchor, "the class whose package holds the templates");
        ClassLoader own = anchor.getClassLoader();
        Thread t = Thread.currentThread();
        ClassLoader before = t.getContextClassLoader();
        t.setContextClassLoader(own);
        try {
            return new PageTemplates(TemplateEngine.createPrecompiled(null, ContentType.Html, own,
                    anchor.getPackageName()));
        } finally {
            t.setContextClassLoader(before);
        }
    }

    /** Renders {@code name.jte} with its parameters by name. */
    public String render(String name, Map<String, Object> params) {
        StringOutput out = new StringOutput();
        engine.render(name + ".jte", params, out);
        return out.toString();
    }

    /** Renders {@code name.jte} with one parameter. */
    public String render(String name, String param, Object value) {
        StringOutput out = new StringOutput();
        engine.render(name + ".jte", Map.of(param, value), out);
        return out.toString();
    }
}
