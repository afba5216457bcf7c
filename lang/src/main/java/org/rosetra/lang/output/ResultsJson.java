package org.rosetra.lang.output;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Map;
import org.rosetra.lang.plan.RunResults;

/** Writes {@link RunResults} in the {@code rosetra-results/1} shape of LANGUAGE.md. */
public final class ResultsJson {
    public static final String FORMAT = "rosetra-results/1";
    private static final JsonFactory FACTORY = new JsonFactory();

    private ResultsJson() {}

    /** The JSON text as UTF-8 bytes, pretty-printed with LF line ends, deterministic. */
    public static byte[] write(RunResults results) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (JsonGenerator json = FACTORY.createGenerator(bytes, JsonEncoding.UTF8)) {
            DefaultPrettyPrinter printer = new DefaultPrettyPrinter()
                    .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                    .withArrayIndenter(new DefaultIndenter("  ", "\n"));
            json.setPrettyPrinter(printer);
            writeResults(json, results);
            json.writeRaw('\n');
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    private static void writeResults(JsonGenerator json, RunResults r) throws IOException {
        json.writeStartObject();
        json.writeStringField("format", FORMAT);
        if (r.title() != null) {
            json.writeStringField("title", r.title());
        }
        json.writeArrayFieldStart("cases");
        for (String c : r.cases()) {
            json.writeString(c);
        }
        json.writeEndArray();

        json.writeObjectFieldStart("rosettes");
        for (var rosette : r.rosettes().entrySet()) {
            json.writeObjectFieldStart(rosette.getKey());
            json.writeStringField("state", rosette.getValue().state());
            json.writeObjectFieldStart("results");
            for (var perCase : rosette.getValue().results().entrySet()) {
                writeNumbers(json, perCase.getKey(), perCase.getValue());
            }
            json.writeEndObject();
            json.writeEndObject();
        }
        json.writeEndObject();

        if (!r.states().isEmpty()) {
            json.writeObjectFieldStart("states");
            for (var state : r.states().entrySet()) {
                writeNumbers(json, state.getKey(), state.getValue());
            }
            json.writeEndObject();
        }

        json.writeObjectFieldStart("values");
        for (var value : r.values().entrySet()) {
            json.writeObjectFieldStart(value.getKey());
            json.writeNumberField("value", value.getValue().value());
            json.writeStringField("dimension", value.getValue().dimension());
            json.writeEndObject();
        }
        json.writeEndObject();

        json.writeArrayFieldStart("checks");
        for (RunResults.CheckOutcome check : r.checks()) {
            json.writeStartObject();
            json.writeStringField("label", check.label());
            json.writeBooleanField("pass", check.pass());
            if (check.utilization() == null || check.utilization().isInfinite()) {
                json.writeNullField("utilization");
            } else {
                json.writeNumberField("utilization", check.utilization());
            }
            if (check.governing() == null) {
                json.writeNullField("governing");
            } else {
                json.writeStringField("governing", check.governing());
            }
            if (check.at() != null) {
                json.writeNumberField("at", check.at());
            }
            json.writeEndObject();
        }
        json.writeEndArray();

        if (!r.series().isEmpty()) {
            json.writeObjectFieldStart("series");
            for (var series : r.series().entrySet()) {
                json.writeObjectFieldStart(series.getKey());
                json.writeNumberField("samples", series.getValue().samples());
                json.writeObjectFieldStart("rosettes");
                for (var rosette : series.getValue().rosettes().entrySet()) {
                    json.writeObjectFieldStart(rosette.getKey());
                    for (var member : rosette.getValue().entrySet()) {
                        RunResults.Extremes x = member.getValue();
                        json.writeObjectFieldStart(member.getKey());
                        json.writeNumberField("max", x.max());
                        json.writeNumberField("t_max", x.tMax());
                        json.writeNumberField("min", x.min());
                        json.writeNumberField("t_min", x.tMin());
                        json.writeEndObject();
                    }
                    json.writeEndObject();
                }
                json.writeEndObject();
                json.writeEndObject();
            }
            json.writeEndObject();
        }
        json.writeEndObject();
    }

    private static void writeNumbers(JsonGenerator json, String name, Map<String, Double> numbers)
            throws IOException {
        json.writeObjectFieldStart(name);
        for (var n : numbers.entrySet()) {
            json.writeNumberField(n.getKey(), n.getValue());
        }
        json.writeEndObject();
    }
}
