package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.function.IntFunction;

/**
 * An invented measured series written by the test: a rectangular rosette swaying under a
 * slowly varying load, three arms in microstrain with two decimals, a time column and
 * optionally a temperature column. The numbers the tool reads are the numbers kept here
 * (each written value is parsed back), so the test's own reduction sees exactly the file.
 */
final class SyntheticSeries {
    final int n;
    final String[] time;
    final String[][] arms;
    final String[] temperature;
    final double[] t;
    final double[][] microstrain;
    final double[] temp;

    private SyntheticSeries(int n, String[] time, String[][] arms, String[] temperature) {
        this.n = n;
        this.time = time;
        this.arms = arms;
        this.temperature = temperature;
        this.t = new double[n];
        this.microstrain = new double[3][n];
        this.temp = temperature == null ? null : new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = Double.parseDouble(time[i]);
            for (int a = 0; a < 3; a++) {
                microstrain[a][i] = parseOrNaN(arms[a][i]);
            }
            if (temperature != null) {
                temp[i] = Double.parseDouble(temperature[i]);
            }
        }
    }

    /**
     * {@code n} samples 10 ms apart, the first at 5 ms (so no sample falls on a whole second),
     * arms of a few hundred microstrain with a little seeded noise; with {@code tempFrom} not NaN a
     * temperature that drifts linearly from {@code tempFrom} by {@code tempRise} over the run.
     */
    static SyntheticSeries swaying(int n, long seed, double tempFrom, double tempRise) {
        Random noise = new Random(seed);
        String[] time = new String[n];
        String[][] arms = new String[3][n];
        String[] temperature = Double.isNaN(tempFrom) ? null : new String[n];
        for (int i = 0; i < n; i++) {
            double s = (i + 0.5) * 0.01;
            time[i] = String.format(Locale.ROOT, "%.3f", s);
            double load = Math.min(1.0, s / 1.5);
            double a = 40 + 380 * load * Math.sin(2 * Math.PI * 0.7 * s) + 5 * noise.nextGaussian();
            double b = -25 + 160 * load * Math.cos(2 * Math.PI * 0.3 * s) + 5 * noise.nextGaussian();
            double c = 15 - 210 * load * Math.sin(2 * Math.PI * 0.5 * s + 1) + 5 * noise.nextGaussian();
            arms[0][i] = String.format(Locale.ROOT, "%.2f", a);
            arms[1][i] = String.format(Locale.ROOT, "%.2f", b);
            arms[2][i] = String.format(Locale.ROOT, "%.2f", c);
            if (temperature != null) {
                temperature[i] = String.format(Locale.ROOT, "%.2f", tempFrom + tempRise * i / Math.max(1, n - 1));
            }
        }
        return new SyntheticSeries(n, time, arms, temperature);
    }

    /** A reading the test spoiled on purpose has no value of its own. */
    private static double parseOrNaN(String text) {
        try {
            return Double.parseDouble(text);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    /** Sets one arm's reading at sample {@code i} (written as given). */
    SyntheticSeries withReading(int arm, int i, String value) {
        String[][] copy = new String[3][];
        for (int a = 0; a < 3; a++) {
            copy[a] = arms[a].clone();
        }
        copy[arm][i] = value;
        return new SyntheticSeries(n, time, copy, temperature);
    }

    /** An RFC 4180 file with a header t_s,g1,g2,g3[,temp_c], comma and decimal point. */
    String csv() {
        return csv(',', '.', false);
    }

    /** The same numbers with another delimiter and decimal mark; header names quoted when asked. */
    String csv(char delimiter, char decimal, boolean quoteHeader) {
        StringBuilder s = new StringBuilder();
        List<String> header = temperature == null ? List.of("t_s", "g1", "g2", "g3")
                : List.of("t_s", "g1", "g2", "g3", "temp_c");
        for (int k = 0; k < header.size(); k++) {
            if (k > 0) {
                s.append(delimiter);
            }
            s.append(quoteHeader ? "\"" + header.get(k) + "\"" : header.get(k));
        }
        s.append("\r\n");
        for (int i = 0; i < n; i++) {
            s.append(mark(time[i], decimal));
            for (int a = 0; a < 3; a++) {
                s.append(delimiter).append(mark(arms[a][i], decimal));
            }
            if (temperature != null) {
                s.append(delimiter).append(mark(temperature[i], decimal));
            }
            s.append("\r\n");
        }
        return s.toString();
    }

    private static String mark(String number, char decimal) {
        return decimal == '.' ? number : number.replace('.', decimal);
    }

    void write(Path file) throws IOException {
        Files.writeString(file, csv(), StandardCharsets.US_ASCII);
    }

    /**
     * Every member of every sample, from the arm strains {@code strains.apply(i)} (fractions, after
     * whatever correction the test applies), through {@link ClosedForm}.
     */
    Map<String, double[]> members(IntFunction<double[]> strains, double e, double nu) {
        return members(strains, e, nu, false);
    }

    Map<String, double[]> members(IntFunction<double[]> strains, double e, double nu, boolean planeStrain) {
        Map<String, double[]> out = new HashMap<>();
        for (String m : ClosedForm.MEMBERS) {
            out.put(m, new double[n]);
        }
        for (int i = 0; i < n; i++) {
            double[] s = strains.apply(i);
            Map<String, Double> one = ClosedForm.rectangular(s[0], s[1], s[2], e, nu, planeStrain);
            final int row = i;
            one.forEach((m, v) -> out.get(m)[row] = v);
        }
        return out;
    }

    /** The arm strains as read, as fractions (1 ue = 1e-6, LANGUAGE.md, "Quantities and units"). */
    double[] asRead(int i) {
        return new double[] {microstrain[0][i] * 1e-6, microstrain[1][i] * 1e-6, microstrain[2][i] * 1e-6};
    }

    /**
     * Checks the tool's largest and smallest value of a member, and the time of each, against the
     * test's own values over the samples. The extreme value must agree to 1e-9 of the member's
     * range; the time must be exactly that of a sample, and that sample's value must reach the
     * extreme within the same tolerance (so a tie of two samples within rounding may go either way).
     */
    void assertExtremes(SeriesRun run, String series, String rosette, String member, double[] expected)
            throws IOException {
        Map<String, Object> got = run.member(series, rosette, member);
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (double v : expected) {
            max = Math.max(max, v);
            min = Math.min(min, v);
        }
        double scale = Math.max(Math.abs(max), Math.abs(min));
        double tol = 1e-9 * scale + (member.startsWith("eps") || member.startsWith("gamma") ? 1e-18 : 1e-6);
        String what = series + " " + rosette + "." + member;
        assertEquals(max, (Double) got.get("max"), tol, what + " max (computed in the test, ClosedForm)");
        assertEquals(min, (Double) got.get("min"), tol, what + " min (computed in the test, ClosedForm)");
        int iMax = indexOf((Double) got.get("t_max"), what + " t_max");
        int iMin = indexOf((Double) got.get("t_min"), what + " t_min");
        assertTrue(expected[iMax] >= max - tol, what + ": at t_max = " + t[iMax] + " the test computes "
                + expected[iMax] + ", not the maximum " + max);
        assertTrue(expected[iMin] <= min + tol, what + ": at t_min = " + t[iMin] + " the test computes "
                + expected[iMin] + ", not the minimum " + min);
    }

    /** The sample at exactly this time (the tool reports times of samples, LANGUAGE.md "Running and results"). */
    int indexOf(double time, String what) {
        for (int i = 0; i < n; i++) {
            if (t[i] == time) {
                return i;
            }
        }
        throw new AssertionError(what + " = " + time + " is not the time of any sample");
    }

    /** The first sample where {@code values} is largest. */
    static int argmax(double[] values) {
        int best = 0;
        for (int i = 1; i < values.length; i++) {
            if (values[i] > values[best]) {
                best = i;
            }
        }
        return best;
    }
}
