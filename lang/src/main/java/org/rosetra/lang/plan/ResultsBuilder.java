package org.rosetra.lang.plan;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.rosetra.lang.syntax.Let;
import org.rosetra.runtime.results.MemberKind;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.results.RosetteResult;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.units.Dimension;

/** Collects an evaluation into {@link RunResults}: SI, with angles in degrees (LANGUAGE.md). */
final class ResultsBuilder {
    private ResultsBuilder() {}

    static RunResults build(Evaluation evaluation, List<CheckResult> checks) {
        List<String> axis = evaluation.axis();
        Map<String, RunResults.RosetteResults> rosettes = new LinkedHashMap<>();
        for (String r : evaluation.rosetteNames()) {
            RosetteModel model = evaluation.rosette(r);
            StrainState[] states = evaluation.strains(r);
            EnumMap<RosetteMember, double[]> results = evaluation.results(r);
            Map<String, Map<String, Double>> perCase = new LinkedHashMap<>();
            for (int i = 0; i < axis.size(); i++) {
                if (states[i] == null) {
                    continue;
                }
                Map<String, Double> members = new LinkedHashMap<>();
                for (var e : results.entrySet()) {
                    members.put(e.getKey().scriptName(), jsonValue(e.getKey(), e.getValue()[i]));
                }
                perCase.put(axis.get(i), members);
            }
            rosettes.put(r, new RunResults.RosetteResults(model.condition().scriptName(), perCase));
        }

        Map<String, Map<String, Double>> states = new LinkedHashMap<>();
        for (String s : evaluation.stateNames()) {
            RosetteResult result = Expressions.stateResult(evaluation.state(s));
            Map<String, Double> members = new LinkedHashMap<>();
            for (var e : result.asMap().entrySet()) {
                members.put(e.getKey().scriptName(), jsonValue(e.getKey(), e.getValue()));
            }
            states.put(s, members);
        }

        Map<String, RunResults.NamedValue> values = new LinkedHashMap<>();
        for (Let let : evaluation.program().lets.values()) {
            if (let.isFunction()) {
                continue;
            }
            Value v = evaluation.let(let.name().text());
            if (v instanceof Value.Number n) {
                double shown = n.dimension().equals(Dimension.ANGLE) ? Math.toDegrees(n.si()) : n.si();
                values.put(let.name().text(), new RunResults.NamedValue(shown, n.dimension().name()));
            }
        }

        List<RunResults.CheckOutcome> outcomes = new ArrayList<>();
        for (CheckResult c : checks) {
            Double utilization = Double.isNaN(c.highest()) ? null : c.highest();
            outcomes.add(new RunResults.CheckOutcome(c.check().label().value(), c.passes(), utilization,
                    c.governingName(), c.at()));
        }
        Map<String, RunResults.SeriesSummary> series = new LinkedHashMap<>();
        for (var e : evaluation.series().entrySet()) {
            Map<String, Map<String, RunResults.Extremes>> perRosette = new LinkedHashMap<>();
            for (var r : e.getValue().extremes().entrySet()) {
                Map<String, RunResults.Extremes> perMember = new LinkedHashMap<>();
                for (var m : r.getValue().entrySet()) {
                    var x = m.getValue();
                    perMember.put(m.getKey().scriptName(), new RunResults.Extremes(jsonValue(m.getKey(), x.max()),
                            x.timeOfMax(), jsonValue(m.getKey(), x.min()), x.timeOfMin()));
                }
                perRosette.put(r.getKey(), perMember);
            }
            series.put(e.getKey(), new RunResults.SeriesSummary(e.getValue().samples(), perRosette));
        }
        return new RunResults(evaluation.program().title(), axis, rosettes, states, values, outcomes, series);
    }

    static double jsonValue(RosetteMember member, double si) {
        return member.kind() == MemberKind.ANGLE ? Math.toDegrees(si) : si;
    }
}
