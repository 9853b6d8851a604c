package ionmark.speciation.internal;

import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import ionmark.acidity.api.GroupClass;
import ionmark.acidity.api.Relation;
import ionmark.acidity.api.SiteType;
import ionmark.speciation.internal.estimate.EstimatedSite;
import ionmark.speciation.internal.estimate.LferEstimator;
import ionmark.speciation.internal.sites.CompiledTable;
import ionmark.speciation.internal.sites.SitePerceiver;
import ionmark.speciation.internal.structure.StructureException;
import ionmark.speciation.internal.structure.StructureReader;
import ionmark.speciation.spi.CalibrationPoint;

/** Calibration input: which class and substituent sum an observed value speaks for. */
final class CalibrationPoints {
    private final CompiledTable table;
    private final StructureReader reader;
    /** The model's macroscopic constants of a structure at 25 °C, I = 0 (a brief analysis). */
    private final Function<String, List<Double>> macroPka;

    CalibrationPoints(CompiledTable table, StructureReader reader, Function<String, List<Double>> macroPka) {
        this.table = table;
        this.reader = reader;
        this.macroPka = macroPka;
    }

    /**
     * Calibration input from one observation with one experimental value: the class and substituent
     * sum Σ of the site that titrates first (the most basic when all perceived sites in −3…17 are
     * bases, the most acidic when all are acids). Mixed acid–base compounds are not used. Raw
     * estimates, no overrides.
     */
    Optional<CalibrationPoint> of(String structure, List<Double> pka) {
        try {
            if (pka.size() != 1) {
                return Optional.empty();
            }
            StructureReader.Prepared prep = reader.read(structure);
            List<EstimatedSite> est = LferEstimator.estimate(table, prep.molecule(),
                    SitePerceiver.perceive(table, prep.molecule())).stream()
                    .filter(s -> !s.site().group().permanent() && s.pka() > -3 && s.pka() < 17).toList();
            long bases = est.stream().filter(s -> s.site().group().type() == SiteType.BASE).count();
            if (est.isEmpty() || (bases != 0 && bases != est.size())) {
                return Optional.empty();
            }
            Comparator<EstimatedSite> byPka = Comparator.comparingDouble(EstimatedSite::pka);
            EstimatedSite first = bases > 0 ? est.stream().max(byPka).orElseThrow() : est.stream().min(byPka)
                    .orElseThrow();
            if (est.size() > 1 && !firstStepNearest(structure, pka.get(0), bases > 0)) {
                return Optional.empty();
            }
            GroupClass g = first.site().group();
            double sigma = g.relation() == Relation.NONE || g.rho() == 0 || Double.isNaN(g.rho())
                    ? 0 : -(first.pka() - g.pka()) / g.rho();
            return Optional.of(new CalibrationPoint(g.id(), sigma, pka.get(0)));
        } catch (StructureException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /**
     * Whether the one experimental value of a compound with several sites of one type is nearer the
     * model's first macroscopic step (lowest for acids, highest for bases) than any other: a single
     * reported value is often a later step (the second pKa of an alkyl phosphate or a dialkylmalonic
     * acid, the first lying below the measured range), and giving it to the first site would drag
     * that class toward the later step.
     */
    private boolean firstStepNearest(String structure, double x, boolean bases) {
        List<Double> macro = macroPka.apply(structure).stream()
                .filter(v -> v > -3 && v < 17).toList();
        if (macro.size() < 2) {
            return true;
        }
        int nearest = 0;
        for (int j = 1; j < macro.size(); j++) {
            if (Math.abs(macro.get(j) - x) < Math.abs(macro.get(nearest) - x)) {
                nearest = j;
            }
        }
        return nearest == (bases ? macro.size() - 1 : 0);
    }
}
