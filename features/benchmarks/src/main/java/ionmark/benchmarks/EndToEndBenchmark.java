package ionmark.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.openscience.cdk.aromaticity.Aromaticity;
import org.openscience.cdk.aromaticity.ElectronDonation;
import org.openscience.cdk.exception.CDKException;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;

import ionmark.acidity.internal.TableSnapshotService;
import ionmark.speciation.api.Conditions;
import ionmark.speciation.internal.Engine;

/**
 * End to end, in full (everything an annotation shows) and brief (read, perceive, estimate, solve at
 * one pH), against a floor that only parses SMILES and perceives rings and aromaticity with CDK. Both walk
 * the same 20 drug-like molecules per operation.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 10, time = 3)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class EndToEndBenchmark {
    Engine engine;
    SmilesParser parser;
    Aromaticity aromaticity;
    final Conditions ph74 = Conditions.atPh(7.4);

    @Setup
    // CDK 2.11 deprecates daylight() without a public replacement; the benchmark needs the engine's Daylight model
    @SuppressWarnings("deprecation")
    public void setUp() {
        engine = new Engine(TableSnapshotService.shipped(), 300);
        parser = new SmilesParser(SilentChemObjectBuilder.getInstance());
        aromaticity = new Aromaticity(ElectronDonation.daylight(), Cycles.or(Cycles.all(), Cycles.all(6)));
    }

    /** 20 molecules per operation: ops/s × 20 = molecules per second. */
    @Benchmark
    public void floorParseRingsAromaticity(Blackhole bh) throws CDKException {
        for (String smi : Molecules.DRUG_LIKE) {
            IAtomContainer mol = parser.parseSmiles(smi);
            Cycles.markRingAtomsAndBonds(mol);
            aromaticity.apply(mol);
            bh.consume(mol);
        }
    }

    /** Everything a notebook card shows, including logP/logD, species structures and pH windows. */
    @Benchmark
    public void endToEndAtPh74(Blackhole bh) {
        for (String smi : Molecules.DRUG_LIKE) {
            bh.consume(engine.analyse(smi, ph74));
        }
    }

    /**
     * Read, perceive, estimate (with derivations and overrides) and solve at one pH: the brief form
     * that {@code batch --brief} writes.
     */
    @Benchmark
    public void endToEndBriefAtPh74(Blackhole bh) {
        for (String smi : Molecules.DRUG_LIKE) {
            bh.consume(engine.analyse(smi, ph74, true));
        }
    }
}
