package ionmark.store.internal;

import org.osgi.service.metatype.annotations.AttributeDefinition;
import org.osgi.service.metatype.annotations.ObjectClassDefinition;

@ObjectClassDefinition(name = "Ionmark table store", description = "Where published table versions and the audit "
        + "trail are kept. Empty URL: H2 in a file under the workspace (one machine).")
@interface StoreConfiguration {
    @AttributeDefinition(name = "JDBC URL", description = "jdbc:h2:file:… or jdbc:postgresql://host:5432/db")
    String jdbcUrl() default "";

    @AttributeDefinition(name = "User")
    String user() default "ionmark";

    @AttributeDefinition(name = "Password file", description = "File whose first line is the password (never the "
            + "password itself in configuration)")
    String passwordFile() default "";

    @AttributeDefinition(name = "Workspace folder", description = "The notebook's workspace, whose .ionmark folder "
            + "holds the H2 store when the JDBC URL is empty. Empty: the framework property ionmark.workspace, else "
            + "./workspace")
    String workspace() default "";

    @AttributeDefinition(name = "Head poll interval (s)", description = "How often every instance checks for a new "
            + "head; a new version reaches every notebook within this time", min = "1")
    int pollSeconds() default 2;
}
