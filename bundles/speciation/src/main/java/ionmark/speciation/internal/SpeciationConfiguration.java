package ionmark.speciation.internal;

import org.osgi.service.metatype.annotations.AttributeDefinition;
import org.osgi.service.metatype.annotations.ObjectClassDefinition;

@ObjectClassDefinition(name = "Ionmark speciation", description = "Limits that protect the notebook from huge or slow input")
@interface SpeciationConfiguration {
    @AttributeDefinition(name = "Largest molecule (heavy atoms)", min = "1")
    int maxHeavyAtoms() default 300;

    @AttributeDefinition(name = "Time limit per molecule (ms)", min = "10")
    int timeoutMillis() default 5000;
}
