package ionmark.host.internal;

import org.osgi.service.metatype.annotations.AttributeDefinition;
import org.osgi.service.metatype.annotations.ObjectClassDefinition;

@ObjectClassDefinition(name = "Ionmark reference notebook host")
@interface HostConfiguration {
    @AttributeDefinition(name = "Workspace folder", description = "Folder of Markdown entries; the demo entries are "
            + "copied into it when it holds none. Empty: the framework property ionmark.workspace, else ./workspace")
    String workspace() default "";

    @AttributeDefinition(name = "User name", description = "The user this single-user host vouches for")
    String user() default "chemist";

    @AttributeDefinition(name = "Roles", description = "Roles the single-user host vouches for (viewer, admin)")
    String[] roles() default {"viewer"};
}
