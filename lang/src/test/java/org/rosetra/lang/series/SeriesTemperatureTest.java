package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The temperature column of a series removes the gauge's thermal output sample by sample
 * (LANGUAGE.md, "What happens to one reading", step 2: subtract TO(T) * thermal_factor / F,
 * TO(T) = a0 + a1 T + a2 T^2 with T in degC; a column in degF is converted first,
 * T[degC] = (T[degF] - 32) * 5 / 9, common practice).
 */
class SeriesTemperatureTest {
    static final double E = SeriesResultsTest.E;
    static final double NU = SeriesResultsTest.NU;
    static final double F = 2.05;
    static final double THERMAL_FACTOR = 2.00;

    static final String DECLARATIONS = """
            material steel {
              E     = 200 GPa
              nu    = 0.3
              yield = 250 MPa
            }
            gauge hot {
              factor         = 2.05
              thermal        = -20, 1.8, -0.04 ue
              thermal_factor = 2.00
            }
            rosette r {
              layout   = rectangular
              gauge    = hot
              material = steel
            }
            """;

    /** TO(T) in microstrain, the polynomial as written in the gauge above. */
    static double thermalOutput(double degC) {
        return -20 + 1.8 * degC - 0.04 * degC * degC;
    }

    /** Steps 1 and 2 for one arm: the instrument set at the gauge's own factor, so e = e_ind. */
    static double corrected(double microstrain, double degC) {
        return (microstrain - thermalOutput(degC) * THERMAL_FACTOR / F) * 1e-6;
    }

    @Test
    void aColumnInDegreesCelsiusRemovesTheThermalOutputAtEverySample(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(400, 31, 18, 27); // 18 degC rising to 45 degC
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + """
                series run from "data.csv" {
                  time        = "t_s" s
                  r           = "g1", "g2", "g3" ue
                  temperature = "temp_c" degC
                }
                """);
        assertEquals(0, run.status(), run.describe());
        Map<String, double[]> expected = data.members(i -> new double[] {
            corrected(data.microstrain[0][i], data.temp[i]),
            corrected(data.microstrain[1][i], data.temp[i]),
            corrected(data.microstrain[2][i], data.temp[i])}, E, NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
    }

    @Test
    void aColumnInDegreesFahrenheitIsConvertedBeforeThePolynomial(@TempDir Path dir) throws Exception {
        SyntheticSeries celsius = SyntheticSeries.swaying(400, 32, 18, 27);
        // The same run logged in degF (two decimals, as a logger would write them).
        StringBuilder csv = new StringBuilder("t_s,g1,g2,g3,temp_f\n");
        double[] degC = new double[celsius.n];
        for (int i = 0; i < celsius.n; i++) {
            String f = String.format(Locale.ROOT, "%.2f", celsius.temp[i] * 9 / 5 + 32);
            degC[i] = (Double.parseDouble(f) - 32) * 5 / 9;
            csv.append(celsius.time[i]).append(',').append(celsius.arms[0][i]).append(',')
                    .append(celsius.arms[1][i]).append(',').append(celsius.arms[2][i]).append(',').append(f).append('\n');
        }
        java.nio.file.Files.writeString(dir.resolve("data.csv"), csv);
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + """
                series run from "data.csv" {
                  time        = "t_s" s
                  r           = "g1", "g2", "g3" ue
                  temperature = "temp_f" degF
                }
                """);
        assertEquals(0, run.status(), run.describe());
        Map<String, double[]> expected = celsius.members(i -> new double[] {
            corrected(celsius.microstrain[0][i], degC[i]),
            corrected(celsius.microstrain[1][i], degC[i]),
            corrected(celsius.microstrain[2][i], degC[i])}, E, NU);
        for (String member : ClosedForm.MEMBERS) {
            celsius.assertExtremes(run, "run", "r", member, expected.get(member));
        }
    }

    @Test
    void aZeroWindowAveragesTheReadingsAfterTheThermalOutputIsRemoved(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(400, 33, 18, 27);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + """
                series run from "data.csv" {
                  time        = "t_s" s
                  r           = "g1", "g2", "g3" ue
                  temperature = "temp_c" degC
                  zero        = 0 s to 1 s
                }
                """);
        assertEquals(0, run.status(), run.describe());
        // "per-arm mean of corrected readings" (LANGUAGE.md, Measured series): steps 1-2 first.
        double[] mean = new double[3];
        int count = 0;
        for (int i = 0; i < data.n; i++) {
            if (data.t[i] <= 1) {
                for (int a = 0; a < 3; a++) {
                    mean[a] += corrected(data.microstrain[a][i], data.temp[i]);
                }
                count++;
            }
        }
        assertEquals(100, count, "the scenario");
        for (int a = 0; a < 3; a++) {
            mean[a] /= count;
        }
        Map<String, double[]> expected = data.members(i -> new double[] {
            corrected(data.microstrain[0][i], data.temp[i]) - mean[0],
            corrected(data.microstrain[1][i], data.temp[i]) - mean[1],
            corrected(data.microstrain[2][i], data.temp[i]) - mean[2]}, E, NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
    }

    @Test
    void aZeroBaselineIsCorrectedAtItsOwnTemperatureBeforeItIsSubtracted(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 34, 18, 27);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + """
                baseline cold {
                  temperature = 12 degC
                  r = 10, -5, 20 ue
                }
                series run from "data.csv" {
                  time        = "t_s" s
                  r           = "g1", "g2", "g3" ue
                  temperature = "temp_c" degC
                  zero        = cold
                }
                """);
        assertEquals(0, run.status(), run.describe());
        // LANGUAGE.md, step 3: subtract the baseline's reading of the same arm, corrected by steps 1-2.
        double[] zero = {corrected(10, 12), corrected(-5, 12), corrected(20, 12)};
        Map<String, double[]> expected = data.members(i -> new double[] {
            corrected(data.microstrain[0][i], data.temp[i]) - zero[0],
            corrected(data.microstrain[1][i], data.temp[i]) - zero[1],
            corrected(data.microstrain[2][i], data.temp[i]) - zero[2]}, E, NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
    }
}
