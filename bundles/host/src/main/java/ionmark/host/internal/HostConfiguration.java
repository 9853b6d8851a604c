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

    @AttributeDefinition(name = "Roles", description = "Roles of a visitor who has not signed in (viewer)")
    String[] roles() default {"viewer"};

    @AttributeDefinition(name = "Users file", description = "Users and PBKDF2 password hashes; empty: "
            + "<workspace>/.ionmark/users.properties, created with one admin on first start")
    String usersFile() default "";
}
