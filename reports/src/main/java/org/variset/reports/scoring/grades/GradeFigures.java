package org.variset.reports.scoring.grades;

import java.util.List;
import java.util.Map;

/**
 * The grade figures of one discipline (docs/spec/metrics.md section 3; JSON keys in brackets).
 *
 * @param histogram count per band label, in band order [{@code histogram}]
 * @param target the target shares per band, or null when the gym has none [{@code target}]
 * @param outsideTarget routes in bands the target does not list [{@code outside_target}]
 * @param emdToTarget Wasserstein-1 distance in bands [{@code emd_to_target}]
 * @param chiSquare Pearson's statistic [{@code chi_square}]
 * @param chiSquareDf degrees of freedom [{@code chi_square_df}]
 * @param chiSquareP upper-tail p-value [{@code chi_square_p}]
 * @param chiSquareReliable false when an expected count is below 1 or more than 20% are below 5
 *     [{@code chi_square_reliable}]
 * @param gaps bands with a target share above zero and no route [{@code gaps}]
 * @param undefined for each null figure, its key and why
 */
public record GradeFigures(
        Map<String, Long> histogram,
        Map<String, Double> target,
        long outsideTarget,
        Double emdToTarget,
        Double chiSquare,
        Integer chiSquareDf,
        Double chiSquareP,
        Boolean chiSquareReliable,
        List<String> gaps,
        Map<String, String> undefined) {}
