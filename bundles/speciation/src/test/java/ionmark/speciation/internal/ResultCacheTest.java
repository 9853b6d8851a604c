package ionmark.speciation.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.annotation.Annotation;

import org.junit.jupiter.api.Test;

import ionmark.acidity.api.AcidityTable;
import ionmark.acidity.api.TableVersion;
import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.api.Curve;

/** Results are kept by (structure, conditions, table version): a repeat is a hit, a new table version a miss. */
class ResultCacheTest {
    static SpeciationConfiguration config(int cacheEntries) {
        return new SpeciationConfiguration() {
            @Override
            public Class<? extends Annotation> annotationType() {
                return SpeciationConfiguration.class;
            }

            @Override
            public int maxHeavyAtoms() {
                return 300;
            }

            @Override
            public int timeoutMillis() {
                return 600_000;
            }

            @Override
            public int workers() {
                return 1;
            }

            @Override
            public int cacheEntries() {
                return cacheEntries;
            }
        };
    }

    @Test
    void aRepeatedCheckIsAHitWithTheSameNumbers() {
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, 600_000, 1, 10);
        try {
            Analysis first = s.analyse("NCC(=O)O", Conditions.atPh(7.4));
            Analysis again = s.analyse("NCC(=O)O  glycine", Conditions.atPh(7.4));
            assertEquals(1, s.cache().hits());
            assertEquals(first.macroPka(), again.macroPka());
            assertEquals(first.sites(), again.sites());
            assertEquals("NCC(=O)O  glycine", again.input(), "the result carries this call's input");
        } finally {
            s.close();
        }
    }

    @Test
    void anotherSpellingWithTheSameNumberingHitsAnotherNumberingMisses() {
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, 600_000, 1, 10);
        try {
            s.analyse("C1CC1C(=O)O", Conditions.atPh(4));
            s.analyse("C2CC2C(=O)O", Conditions.atPh(4));
            assertEquals(1, s.cache().hits());
            Analysis other = s.analyse("OC(=O)C1CC1", Conditions.atPh(4));
            assertEquals(1, s.cache().hits(), "atom numbers differ: the site numbers would not hold");
            assertTrue(other.ok(), other.error());
        } finally {
            s.close();
        }
    }

    @Test
    void otherConditionsMiss() {
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, 600_000, 1, 10);
        try {
            Analysis a = s.analyse("CC(=O)O", Conditions.atPh(4));
            Analysis b = s.analyse("CC(=O)O", Conditions.atPh(4).withTemperature(37));
            assertEquals(0, s.cache().hits());
            assertNotEquals(a.sites().get(0).pka(), b.sites().get(0).pka());
        } finally {
            s.close();
        }
    }

    @Test
    void aNewTableVersionMisses() {
        TableSnapshotService tables = new TableSnapshotService(null);
        SpeciationService s = new SpeciationService(tables, config(10));
        try {
            Analysis old = s.analyse("CC(=O)O", Conditions.atPh(4.76));
            s.analyse("CC(=O)O", Conditions.atPh(4.76));
            assertEquals(1, s.cache().hits());
            AcidityTable now = tables.current();
            TableVersion v = now.version();
            tables.install(now.withVersion(new TableVersion(v.number() + 1, "test", v.time(), "next", "", v.number())));
            Analysis fresh = s.analyse("CC(=O)O", Conditions.atPh(4.76));
            assertEquals(1, s.cache().hits(), "an old table's result must not answer for the new table");
            assertEquals("v" + (v.number() + 1), fresh.tableVersion().split(" ")[0]);
            assertNotEquals(old.tableVersion(), fresh.tableVersion());
        } finally {
            s.close();
        }
    }

    @Test
    void aCachedCurveCannotBeChangedByACaller() {
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, 600_000, 1, 10);
        try {
            Curve c = s.curve("CC(=O)O", Conditions.noPh(), 0, 14, 0.5).curve();
            c.meanCharge()[0] = 99;
            Curve d = s.curve("CC(=O)O", Conditions.noPh(), 0, 14, 0.5).curve();
            assertEquals(1, s.cache().hits());
            assertNotEquals(99, d.meanCharge()[0]);
        } finally {
            s.close();
        }
    }

    @Test
    void theOldestEntryGoesFirst() {
        SpeciationService s = new SpeciationService(TableSnapshotService.shipped(), 300, 600_000, 1, 2);
        try {
            s.analyse("CC(=O)O", Conditions.atPh(4));
            s.analyse("CCN", Conditions.atPh(4));
            s.analyse("CC(=O)O", Conditions.atPh(4)); // hit; acetic acid is now the most recent
            s.analyse("c1ccncc1", Conditions.atPh(4)); // ethylamine goes
            assertEquals(2, s.cache().size());
            s.analyse("CC(=O)O", Conditions.atPh(4));
            assertEquals(2, s.cache().hits());
            s.analyse("CCN", Conditions.atPh(4));
            assertEquals(2, s.cache().hits());
            Analysis same = s.analyse("c1ccncc1", Conditions.atPh(4));
            assertSame(same.getClass(), Analysis.class);
        } finally {
            s.close();
        }
    }
}
