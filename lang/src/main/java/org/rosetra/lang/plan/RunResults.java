package org.rosetra.lang.plan;

import java.util.List;
import java.util.Map;

/**
 * Everything a run computed, in the units of results.json (SI; strain as a fraction, stress in
 * Pa, angles in degrees). Maps keep the order in which the script wrote things.
 *
 * @param title    the script's title, or null
 * @param cases    load cases then combinations, as written
 * @param rosettes per rosette: its state and, per case where it has a result, member values
 * @param states   strain or stress states given directly, with their members
 * @param values   every {@code let} value that is a number or a quantity
 * @param checks   every check, in script order
 * @param series   per measured series: samples and per rosette member extremes
 */
public record RunResults(
        String title,
        List<String> cases,
        Map<String, RosetteResults> rosettes,
        Map<String, Map<String, Double>> states,
        Map<String, NamedValue> values,
        List<CheckOutcome> checks,
        Map<String, SeriesSummary> series) {

    /** A rosette's plane condition and its member values per case. */
    public record RosetteResults(String state, Map<String, Map<String, Double>> results) {}

    /** A named value in SI with its dimension's name ("stress", "none", ...). */
    public record NamedValue(double value, String dimension) {}

    /**
     * The outcome of one check. {@code utilization} is null when no case defines the check;
     * {@code at} is the time in seconds when a sample of a series governs.
     */
    public record CheckOutcome(String label, boolean pass, Double utilization, String governing, Double at) {}

    /** A measured series: its sample count and, per rosette and member, the extremes. */
    public record SeriesSummary(long samples, Map<String, Map<String, Extremes>> rosettes) {}

    /** Largest and smallest value of a history and the time of each, in seconds. */
    public record Extremes(double max, double tMax, double min, double tMin) {}

    /** True when every check passed. */
    public boolean allChecksPass() {
        return checks.stream().allMatch(CheckOutcome::pass);
    }
}
