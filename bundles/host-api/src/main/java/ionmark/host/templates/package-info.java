/**
 * Page templates for the host and the bundles that contribute pages to it: one small helper that renders a
 * bundle's precompiled jte templates with contextual escaping ({@link ionmark.host.templates.PageTemplates}).
 * Using it needs the jte runtime (bundle {@code ionmark.jte}); the host contract in {@code ionmark.host.api} does not.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("1.0.0")
package ionmark.host.templates;
