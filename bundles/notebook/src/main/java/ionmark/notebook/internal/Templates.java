package ionmark.notebook.internal;

import java.util.Map;

import gg.jte.ContentType;
import gg.jte.TemplateEngine;
import gg.jte.output.StringOutput;

/**
 * The notebook's page templates ({@code src/main/jte/*.jte}), compiled to Java classes in this package at build time
 * by jte's Maven plugin and rendered as HTML with contextual escaping: every {@code ${...}} is escaped for where it
 * stands (text, attribute value); only {@code $unsafe{...}} places contributed HTML as it is.
 */
final class Templates {
    private static final TemplateEngine ENGINE = create();

    private Templates() {
    }

    /**
     * Precompiled templates, loaded from this bundle's class loader. jte takes the loader of precompiled classes
     * from the thread's context class loader when the engine is made (the one it is given is ignored), and in OSGi
     * that loader does not see this bundle: so it is set for the moment of creation.
     */
    static TemplateEngine create() {
        Thread t = Thread.currentThread();
        ClassLoader before = t.getContextClassLoader();
        t.setContextClassLoader(Templates.class.getClassLoader());
        try {
            return TemplateEngine.createPrecompiled(null, ContentType.Html, Templates.class.getClassLoader(),
                    Templates.class.getPackageName());
        } finally {
            t.setContextClassLoader(before);
        }
    }

    /** Renders {@code name.jte} with its parameters by name. */
    static String render(String name, Map<String, Object> params) {
        StringOutput out = new StringOutput();
        ENGINE.render(name + ".jte", params, out);
        return out.toString();
    }
}
