package ionmark.speciation.internal.estimate;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;

/** The twisted-substituent rule names table substituents by id; a renamed entry would switch it off silently. */
class TwistableIdsTest {
    @Test
    void everyTwistableSubstituentIsInTheShippedTable() {
        Set<String> ids = TableSnapshotService.shipped().substituents().stream().map(s -> s.id())
                .collect(Collectors.toSet());
        for (String id : LferEstimator.TWISTABLE) {
            assertTrue(ids.contains(id), id + " is not a substituent of the shipped table");
        }
    }
}
