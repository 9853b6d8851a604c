package ionmark.speciation.internal.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Analysis;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.internal.SpeciationService;

/** Effective fitted values and thinly fitted classes, as the derivation and warnings show them. */
class ClassProvenanceTest {
    static final SpeciationService S = new SpeciationService(TableSnapshotService.shipped(), 300, 30_000);

    @Test
    void theOneSiteStartValueIsTheCompilationValue() {
        ClassProvenance.Record r = ClassProvenance.parse("calib fit (2026-12-03): n=142, trimmed 2, RMSE 0.33, r² 0.87; "
                + "before pKa 4.76, rho 3.95; calib whole-model refinement: 308 compounds with a site of this class, "
                + "pKa 4.74 -> 4.74");
        assertEquals(4.76, r.compilationPka());
        assertEquals(308, r.compounds());
    }

    @Test
    void withoutAOneSiteFitTheRefinementStartIsUsed() {
        ClassProvenance.Record r = ClassProvenance.parse("Site value ...; calib whole-model refinement: 118 compounds "
                + "with a site of this class, pKa 4.30 -> 4.50, rho 3.95 -> 3.97");
        assertEquals(4.30, r.compilationPka());
        assertEquals(118, r.compounds());
    }

    @Test
    void aNoteWithoutACalibrationRecordSaysNothing() {
        ClassProvenance.Record r = ClassProvenance.parse("");
        assertNull(r.compilationPka());
        assertNull(r.compounds());
    }

    @Test
    void pyrimidineShowsItsFittedValueAsEffectiveWithTheParentValueBeside() {
        // pyrimidine 1.3 (Albert, from memory); the shipped class is fitted well above it
        Analysis a = S.analyse("c1cncnc1", Conditions.noPh());
        assertTrue(a.sites().stream().flatMap(s -> s.derivation().stream())
                .anyMatch(t -> t.label().startsWith("effective fitted value") && t.label().contains("1.30")),
                a.sites().toString());
    }

    @Test
    void benzoicAcidNeedsNoSuchLine() {
        Analysis a = S.analyse("OC(=O)c1ccccc1", Conditions.noPh());
        assertTrue(a.sites().stream().flatMap(s -> s.derivation().stream())
                .noneMatch(t -> t.label().startsWith("effective fitted value")));
    }

    @Test
    void aThinlyFittedClassWarns() {
        // every class the shipped table fitted on fewer than five compounds warns on its own first example
        var table = TableSnapshotService.shipped();
        int checked = 0;
        for (var g : table.groups()) {
            var fit = table.fit(g.id());
            if (fit.isEmpty() || fit.get().n() <= 0 || fit.get().n() >= ClassProvenance.THIN || g.matches().isEmpty()) {
                continue;
            }
            Analysis a = S.analyse(g.matches().get(0), Conditions.noPh());
            if (a.sites().stream().noneMatch(x -> x.group().equals(g.id()))) {
                continue; // the example's site is taken by a more specific class or a tautomer of another class
            }
            assertTrue(a.warnings().stream().anyMatch(w -> w.contains(g.id()) && w.contains(fit.get().n() + " compound")),
                    g.id() + ": " + a.warnings());
            checked++;
        }
        assertTrue(checked >= 3, "only " + checked + " thinly fitted classes checked");
    }
}
