package ionmark.pipeline;

import java.io.IOException;
import java.io.OutputStream;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.nio.channels.Channels;
import java.nio.channels.WritableByteChannel;

import org.apache.beam.sdk.io.FileIO;
import org.apache.parquet.conf.ParquetConfiguration;
import org.apache.parquet.conf.PlainParquetConfiguration;
import org.apache.parquet.example.data.Group;
import org.apache.parquet.hadoop.ParquetWriter;
import org.apache.parquet.hadoop.example.ExampleParquetWriter;
import org.apache.parquet.hadoop.metadata.CompressionCodecName;
import org.apache.parquet.io.OutputFile;
import org.apache.parquet.io.PositionOutputStream;
import org.apache.parquet.schema.MessageType;

/**
 * Writes JSON records as Parquet rows ({@link ParquetRows}) into the channel Beam's {@link FileIO} opens, so
 * the files land wherever Beam's file systems reach. parquet-java's writer runs on a
 * {@link PlainParquetConfiguration} with its pages compressed by {@link SnappyCodecs}: no Hadoop on the
 * classpath.
 */
final class ParquetSink implements FileIO.Sink<String> {
    private static final long serialVersionUID = 1L;

    /** Which JSON records become which rows. */
    enum Layout {
        /** The annotate job's records ({@link ParquetRows}). */
        RECORDS(ParquetRows.SCHEMA),
        /** The impact job's comparisons ({@link ImpactRows}). */
        IMPACT(ImpactRows.SCHEMA);

        private final MessageType schema;

        Layout(MessageType schema) {
            this.schema = schema;
        }

        Group row(String json) {
            return this == RECORDS ? ParquetRows.of(json) : ImpactRows.of(json);
        }
    }

    private final Layout layout;
    private transient ParquetWriter<Group> writer;

    ParquetSink(Layout layout) {
        this.layout = layout;
    }

    @Override
    public void open(WritableByteChannel channel) throws IOException {
        writer = builder(new ChannelFile(channel))
                .withType(layout.schema)
                .withCompressionCodec(CompressionCodecName.SNAPPY)
                .withCodecFactory(new SnappyCodecs())
                .build();
    }

    /**
     * {@code ExampleParquetWriter.builder(OutputFile).withConf(ParquetConfiguration)}. Both methods have
     * overloads that take Hadoop types ({@code Path}, {@code Configuration}), and javac needs those classes to
     * choose between overloads; called by their exact signatures instead, Hadoop stays off both classpaths.
     */
    static ExampleParquetWriter.Builder builder(OutputFile file) throws IOException {
        // method handles, not Class.getMethod: reflection would load every overload's parameter types
        MethodHandles.Lookup l = MethodHandles.publicLookup();
        try {
            Object b = l.findStatic(ExampleParquetWriter.class, "builder", MethodType.methodType(
                    ExampleParquetWriter.Builder.class, OutputFile.class)).invoke(file);
            return (ExampleParquetWriter.Builder) l.findVirtual(ParquetWriter.Builder.class, "withConf", MethodType
                    .methodType(ParquetWriter.Builder.class, ParquetConfiguration.class)).invoke(b,
                            new PlainParquetConfiguration());
        } catch (RuntimeException | Error e) {
            throw e;
        } catch (Throwable e) {
            throw new IOException("parquet-java's writer builder is not the one this module was built for: " + e, e);
        }
    }

    @Override
    public void write(String record) throws IOException {
        writer.write(layout.row(record));
    }

    /** Closes the writer, which writes the footer; Beam closes the channel itself. */
    @Override
    public void flush() throws IOException {
        writer.close();
    }

    /** A write-once Parquet output over a channel, counting its position. */
    private static final class ChannelFile implements OutputFile {
        private final WritableByteChannel channel;

        ChannelFile(WritableByteChannel channel) {
            this.channel = channel;
        }

        @Override
        public PositionOutputStream create(long blockSizeHint) {
            OutputStream out = Channels.newOutputStream(channel);
            return new PositionOutputStream() {
                private long pos;

                @Override
                public long getPos() {
                    return pos;
                }

                @Override
                public void write(int b) throws IOException {
                    out.write(b);
                    pos++;
                }

                @Override
                public void write(byte[] b, int off, int len) throws IOException {
                    out.write(b, off, len);
                    pos += len;
                }

                @Override
                public void flush() throws IOException {
                    out.flush();
                }

                /** Beam owns the channel: closing the writer must not close it. */
                @Override
                public void close() throws IOException {
                    out.flush();
                }
            };
        }

        @Override
        public PositionOutputStream createOrOverwrite(long blockSizeHint) {
            return create(blockSizeHint);
        }

        @Override
        public boolean supportsBlockSize() {
            return false;
        }

        @Override
        public long defaultBlockSize() {
            return 0;
        }
    }
}
