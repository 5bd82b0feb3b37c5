package org.variset.reports.figures;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.variset.archive.grade.Discipline;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.route.HoldSize;
import org.variset.archive.settings.GymSettings;
import org.variset.archive.vocabulary.Vocabulary;
import org.variset.archive.vocabulary.VocabularyField;
import org.variset.reports.scoring.grades.GradeDistribution;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.scoring.grip.CircularStatistics;
import org.variset.reports.scoring.grip.GripStatistics;
import org.variset.reports.scoring.variety.AngleBand;
import org.variset.reports.scoring.variety.CategoryVariety;
import org.variset.reports.scoring.variety.VarietyFigures;

/**
 * Every per-set figure of docs/spec/metrics.md (sections 1, 2, 3, 4 and 6) for one set of routes: a reset, a standing set or
 * one setter's routes. Repetition and the score need other sets too and live with the audit.
 *
 * @param routes how many routes
 * @param grip grip directions of every hand-role placement [{@code grip}]
 * @param holds hold types of every placement [{@code holds}]
 * @param holdShapes hold_ref labels of every placement [{@code hold_shapes}]
 * @param sizes sizes of every placement [{@code sizes}]
 * @param moves move descriptors of every route [{@code moves}]
 * @param styles style tags of every route [{@code styles}]
 * @param angles wall-angle bands of the routes [{@code angles}]
 * @param grades grade figures per discipline present [{@code grades}]
 * @param profiles difficulty profiles [{@code profiles}]
 * @param line route lines [{@code line}]
 */
public record SetFigures(
        int routes,
        GripStatistics grip,
        VarietyFigures holds,
        VarietyFigures holdShapes,
        VarietyFigures sizes,
        VarietyFigures moves,
        VarietyFigures styles,
        VarietyFigures angles,
        Map<Discipline, GradeFigures> grades,
        ProfileFigures profiles,
        LineFigures line) {

    /** The figures of a set under the gym's settings. */
    public static SetFigures of(List<RouteRecord> set, GymSettings settings) {
        Vocabulary v = settings.vocabulary();
        List<HoldRecord> all = set.stream().flatMap(r -> r.holds().stream()).toList();
        return new SetFigures(
                set.size(),
                grip(all),
                count(
                        all.stream().map(HoldRecord::type).toList(),
                        v.terms(VocabularyField.HOLD_TYPES).size()),
                count(all.stream().map(HoldRecord::holdRef).toList(), null),
                count(
                        all.stream()
                                .map(h -> h.size() == null ? null : h.size().word())
                                .toList(),
                        HoldSize.values().length),
                count(
                        set.stream().flatMap(r -> r.moves().stream()).toList(),
                        v.terms(VocabularyField.MOVES).size()),
                count(
                        set.stream().flatMap(r -> r.styles().stream()).toList(),
                        v.terms(VocabularyField.STYLES).size()),
                count(
                        set.stream()
                                .map(r -> r.angleDeg() == null ? null : AngleBand.label(AngleBand.of(r.angleDeg())))
                                .toList(),
                        null),
                grades(set, settings),
                ProfileFigures.of(set),
                LineFigures.of(set, settings.reachFactor(), settings.reachHeightM()));
    }

    /** Grip directions of every hand-role placement; a hold with two directions gives two (docs/spec/metrics.md 1). */
    private static GripStatistics grip(List<HoldRecord> holds) {
        List<Double> degrees = new ArrayList<>();
        int undirected = 0;
        for (HoldRecord h : holds) {
            if (!h.isHand()) {
                continue;
            }
            if (h.grips().isEmpty()) {
                undirected++;
            }
            degrees.addAll(h.grips());
        }
        return CircularStatistics.of(
                degrees.stream().mapToDouble(Double::doubleValue).toArray(), undirected);
    }

    /** Counts values per category, first seen first; nulls are missing. */
    private static VarietyFigures count(List<String> values, Integer vocabularySize) {
        Map<String, Long> counts = new LinkedHashMap<>();
        long missing = 0;
        for (String x : values) {
            if (x == null) {
                missing++;
            } else {
                counts.merge(x, 1L, Long::sum);
            }
        }
        return CategoryVariety.of(counts, missing, vocabularySize);
    }

    /** One block per discipline present, boulders first (docs/spec/metrics.md section 3). */
    private static Map<Discipline, GradeFigures> grades(List<RouteRecord> set, GymSettings settings) {
        Map<Discipline, GradeFigures> out = new EnumMap<>(Discipline.class);
        for (Discipline d : Discipline.values()) {
            double[] values = set.stream()
                    .filter(r -> r.discipline() == d)
                    .mapToDouble(RouteRecord::ircra)
                    .toArray();
            if (values.length > 0) {
                out.put(d, GradeDistribution.of(values, settings.bands(d), settings.target(d)));
            }
        }
        return out;
    }

    /** The share of directed hand grips in a sector, or null without any. */
    public Double sectorShare(int sector) {
        return grip.n() == 0 ? null : grip.sectors().get(sector) / (double) grip.n();
    }
}
