package ionmark.pipeline;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.util.Arrays;
import java.util.List;

import org.apache.beam.sdk.coders.CoderException;
import org.apache.beam.sdk.coders.SerializableCoder;
import org.junit.jupiter.api.Test;

/** The chunk coder gives back every field (nulls, entries, several pH values, non-ASCII text) and costs fewer bytes. */
class ChunkCoderTest {
    private static final Chunk CHUNK = new Chunk(List.of(
            Structure.of("/data/set.sdf", "D00001", "Brc1cccnc1", null, List.of(2.0, 7.4, -0.5)),
            Structure.of("/data/set.sdf", "bad", "C1CC(", "cannot parse: ring not closed", List.of()),
            new Structure("/ws/buffer.md", "buffer", "# Puffer 25 °C\n\nAt pH 7.4 (PBS) …", null, List.of(7.4), 3, true)));

    @Test
    void decodesWhatItEncoded() throws Exception {
        byte[] bytes = encode(CHUNK);
        Chunk back = ChunkCoder.of().decode(new ByteArrayInputStream(bytes));
        assertEquals(CHUNK, back);
        assertArrayEquals(bytes, encode(back), "the same chunk gives the same bytes");
    }

    @Test
    void isSmallerThanJavaSerialization() throws Exception {
        ByteArrayOutputStream java = new ByteArrayOutputStream();
        SerializableCoder.of(Chunk.class).encode(CHUNK, java);
        int ours = encode(CHUNK).length;
        assertEquals(true, ours * 2 < java.size(), ours + " bytes against " + java.size());
    }

    @Test
    void aCutChunkIsAnErrorNotAShortChunk() throws Exception {
        byte[] bytes = encode(CHUNK);
        byte[] cut = Arrays.copyOf(bytes, bytes.length - 1);
        assertThrows(CoderException.class, () -> ChunkCoder.of().decode(new ByteArrayInputStream(cut)));
    }

    private static byte[] encode(Chunk c) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ChunkCoder.of().encode(c, out);
        return out.toByteArray();
    }
}
