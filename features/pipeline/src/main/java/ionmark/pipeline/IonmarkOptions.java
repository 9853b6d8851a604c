package ionmark.pipeline;

import org.apache.beam.sdk.options.Default;
import org.apache.beam.sdk.options.Description;
import org.apache.beam.sdk.options.PipelineOptions;
import org.apache.beam.sdk.options.Validation;

/** The pipeline's options; every Beam option ({@code --runner}, {@code --targetParallelism} …) works too. */
public interface IonmarkOptions extends PipelineOptions {
    @Description("Input files: comma-separated paths or glob patterns (SMILES, TSV with an id/smiles header, SDF, "
            + "Markdown .md), or a folder of Markdown entries")
    @Validation.Required
    String getIn();

    void setIn(String v);

    @Description("Output folder (created); records-*.jsonl for annotate, impact-*.jsonl for impact")
    @Validation.Required
    String getOut();

    void setOut(String v);

    @Description("pH values, comma-separated (one record per structure and pH); Markdown structures use their "
            + "stated pH and fall back to these")
    @Default.String("")
    String getPh();

    void setPh(String v);

    @Description("Temperature, °C")
    @Default.Double(25.0)
    double getTemp();

    void setTemp(double v);

    @Description("Ionic strength, mol/L")
    @Default.Double(0.0)
    double getIonic();

    void setIonic(double v);

    @Description("Table file (canonical table JSON); empty or 'shipped': the shipped table")
    @Default.String("")
    String getTable();

    void setTable(String v);

    @Description("The brief record (batch --brief): no species, logP, logD, windows or isoelectric point")
    @Default.Boolean(false)
    boolean getBrief();

    void setBrief(boolean v);

    @Description("Also write Parquet, one row per structure and pH: the records (records-*.parquet), or for the "
            + "impact job every comparison, changed or not (impact-*.parquet)")
    @Default.Boolean(false)
    boolean getParquet();

    void setParquet(boolean v);

    @Description("Output shards; 0 lets the runner choose (the direct runner: one file per bundle)")
    @Default.Integer(0)
    int getShards();

    void setShards(int v);

    @Description("Keys the structures are spread over; 0: one per thread on the direct runner, random keys elsewhere")
    @Default.Integer(0)
    int getBuckets();

    void setBuckets(int v);

    @Description("Impact job: the table before the change (file or 'shipped')")
    @Default.String("")
    String getBefore();

    void setBefore(String v);

    @Description("Impact job: the table after the change (file or 'shipped')")
    @Default.String("")
    String getAfter();

    void setAfter(String v);

    @Description("Impact job: report a fraction-neutral change larger than this")
    @Default.Double(0.05)
    double getThreshold();

    void setThreshold(double v);

    @Description("Largest structure, heavy atoms (the speciation bundle's default)")
    @Default.Integer(EngineSpec.MAX_HEAVY_ATOMS)
    int getMaxHeavyAtoms();

    void setMaxHeavyAtoms(int v);

    @Description("Time limit per structure, ms (the speciation bundle's default)")
    @Default.Integer(EngineSpec.TIMEOUT_MILLIS)
    int getTimeoutMillis();

    void setTimeoutMillis(int v);
}
