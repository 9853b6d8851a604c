package ionmark.pipeline;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;

import org.apache.beam.sdk.coders.AtomicCoder;
import org.apache.beam.sdk.coders.CoderException;
import org.apache.beam.sdk.coders.StringUtf8Coder;
import org.apache.beam.sdk.util.VarInt;

/**
 * A chunk of structures as bytes: per structure its strings (UTF-8, length-prefixed), its pH values as doubles,
 * the pinned version and the entry flag. Java serialization, Beam's fallback for a {@link java.io.Serializable}
 * record, writes class descriptors and goes through reflection for every chunk the spread step moves; this writes
 * only the fields.
 */
public final class ChunkCoder extends AtomicCoder<Chunk> {
    private static final long serialVersionUID = 1L;
    private static final ChunkCoder INSTANCE = new ChunkCoder();
    private static final StringUtf8Coder TEXT = StringUtf8Coder.of();

    private ChunkCoder() {
    }

    public static ChunkCoder of() {
        return INSTANCE;
    }

    @Override
    public void encode(Chunk chunk, OutputStream out) throws IOException {
        if (chunk == null) {
            throw new CoderException("cannot encode a null chunk");
        }
        VarInt.encode(chunk.structures().size(), out);
        for (Structure s : chunk.structures()) {
            TEXT.encode(s.source(), out);
            TEXT.encode(s.id(), out);
            TEXT.encode(s.text(), out);
            out.write(s.error() == null ? 0 : 1);
            if (s.error() != null) {
                TEXT.encode(s.error(), out);
            }
            VarInt.encode(s.phs().size(), out);
            for (double ph : s.phs()) {
                long bits = Double.doubleToRawLongBits(ph);
                for (int i = 56; i >= 0; i -= 8) {
                    out.write((int) (bits >>> i));
                }
            }
            VarInt.encode(s.pinnedVersion(), out);
            out.write(s.entry() ? 1 : 0);
        }
    }

    @Override
    public Chunk decode(InputStream in) throws IOException {
        int n = VarInt.decodeInt(in);
        List<Structure> structures = new ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            String source = TEXT.decode(in);
            String id = TEXT.decode(in);
            String text = TEXT.decode(in);
            String error = flag(in) ? TEXT.decode(in) : null;
            int phCount = VarInt.decodeInt(in);
            List<Double> phs = new ArrayList<>(phCount);
            for (int i = 0; i < phCount; i++) {
                long bits = 0;
                for (int b = 0; b < 8; b++) {
                    bits = (bits << 8) | next(in);
                }
                phs.add(Double.longBitsToDouble(bits));
            }
            int pinned = VarInt.decodeInt(in);
            structures.add(new Structure(source, id, text, error, phs, pinned, flag(in)));
        }
        return new Chunk(structures);
    }

    private static boolean flag(InputStream in) throws IOException {
        return next(in) == 1;
    }

    private static int next(InputStream in) throws IOException {
        int b = in.read();
        if (b < 0) {
            throw new CoderException("a chunk ends early");
        }
        return b;
    }

    @Override
    public void verifyDeterministic() {
        // the same chunk always gives the same bytes
    }
}
