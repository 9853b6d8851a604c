package ionmark.speciation.internal;

import org.osgi.service.metatype.annotations.AttributeDefinition;
import org.osgi.service.metatype.annotations.ObjectClassDefinition;

@ObjectClassDefinition(name = "Ionmark speciation", description = "Limits that protect the notebook from huge or slow input")
@interface SpeciationConfiguration {
    @AttributeDefinition(name = "Largest molecule (heavy atoms)", min = "1")
    int maxHeavyAtoms() default 300;

    @AttributeDefinition(name = "Time budget per structure (ms)", min = "10", description = "A structure that takes "
            + "longer is not annotated; its card says so")
    int timeoutMillis() default 5000;

    @AttributeDefinition(name = "Structures analysed at once", min = "1", description = "Workers of the analysis "
            + "pool; more requests wait (a few per worker), beyond that they are answered busy")
    int workers() default 2;

    @AttributeDefinition(name = "Results kept (entries)", min = "0", description = "Least recently used results "
            + "go first; 0 turns the cache off")
    int cacheEntries() default 2000;
}
