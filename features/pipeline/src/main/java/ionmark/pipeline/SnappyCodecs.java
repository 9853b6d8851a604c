package ionmark.pipeline;

import java.io.IOException;

import org.apache.parquet.bytes.BytesInput;
import org.apache.parquet.compression.CompressionCodecFactory;
import org.apache.parquet.hadoop.metadata.CompressionCodecName;
import org.xerial.snappy.Snappy;

/**
 * Page compression for the Parquet writer without Hadoop: parquet-hadoop's own codec factory loads Hadoop's
 * compression classes even for Snappy. Parquet's SNAPPY is the raw Snappy block format, which snappy-java
 * writes and reads directly; UNCOMPRESSED passes pages through.
 */
final class SnappyCodecs implements CompressionCodecFactory {
    @Override
    public BytesInputCompressor getCompressor(CompressionCodecName codec) {
        check(codec);
        return new BytesInputCompressor() {
            @Override
            public BytesInput compress(BytesInput bytes) throws IOException {
                return codec == CompressionCodecName.SNAPPY ? BytesInput.from(Snappy.compress(heapBytes(bytes)))
                        : bytes;
            }

            @Override
            public CompressionCodecName getCodecName() {
                return codec;
            }

            @Override
            public void release() {
            }
        };
    }

    @Override
    public BytesInputDecompressor getDecompressor(CompressionCodecName codec) {
        check(codec);
        return new BytesInputDecompressor() {
            @Override
            public BytesInput decompress(BytesInput bytes, int uncompressedSize) throws IOException {
                if (codec == CompressionCodecName.UNCOMPRESSED) {
                    return bytes;
                }
                byte[] out = new byte[uncompressedSize];
                Snappy.uncompress(heapBytes(bytes), 0, (int) bytes.size(), out, 0);
                return BytesInput.from(out);
            }

            @Override
            public void decompress(java.nio.ByteBuffer input, int compressedSize, java.nio.ByteBuffer output,
                    int uncompressedSize) throws IOException {
                byte[] in = new byte[compressedSize];
                input.get(in);
                output.put(heapBytes(decompress(BytesInput.from(in), uncompressedSize)));
            }

            @Override
            public void release() {
            }
        };
    }

    @Override
    public void release() {
    }

    private static void check(CompressionCodecName codec) {
        if (codec != CompressionCodecName.SNAPPY && codec != CompressionCodecName.UNCOMPRESSED) {
            throw new IllegalArgumentException("Parquet output supports SNAPPY and UNCOMPRESSED pages, not " + codec);
        }
    }

    /** Snappy's Java API takes heap arrays; Parquet's allocator-based replacement would only add a buffer life cycle. */
    @SuppressWarnings("deprecation")
    private static byte[] heapBytes(BytesInput bytes) throws IOException {
        return bytes.toByteArray();
    }
}
