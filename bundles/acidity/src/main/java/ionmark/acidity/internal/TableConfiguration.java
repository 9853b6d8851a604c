package ionmark.acidity.internal;

import org.osgi.service.metatype.annotations.AttributeDefinition;
import org.osgi.service.metatype.annotations.ObjectClassDefinition;

@ObjectClassDefinition(name = "Ionmark shared pKa table",
        description = "Where the current table comes from. Empty file: the table shipped in the bundle.")
@interface TableConfiguration {
    @AttributeDefinition(name = "Table file", description = "A table JSON file to use instead of the shipped one; "
            + "polled, and a valid change becomes current within the poll interval")
    String tableFile() default "";

    @AttributeDefinition(name = "Poll interval (s)", description = "How often the table file is checked", min = "1")
    int pollSeconds() default 2;
}
