package org.variset.reports.scoring.grip;

import java.util.List;
import java.util.Map;

/**
 * The grip-direction figures of one set of routes (docs/spec/metrics.md section 1; JSON keys in brackets). A figure that is
 * undefined is null, and {@link #undefined()} says why.
 *
 * @param n number of directed observations [{@code n}]
 * @param undirected placements with a hand role and no direction [{@code undirected}]
 * @param resultantLength mean resultant length R̄ = R / n [{@code resultant_length}]
 * @param meanDirectionDeg atan2(S, C) in [0, 360) [{@code mean_direction_deg}]
 * @param circularVariance 1 − R̄ [{@code circular_variance}]
 * @param circularSdDeg sqrt(−2 ln R̄) in degrees [{@code circular_sd_deg}]
 * @param rayleighZ n R̄² [{@code rayleigh_z}]
 * @param rayleighP the Rayleigh test's p-value [{@code rayleigh_p}]
 * @param axialResultantLength R̄ of the doubled angles [{@code axial_resultant_length}]
 * @param sectors counts in the eight 45° sectors, sector 0 (facing up) first [{@code sectors}]
 * @param sectorEntropy Shannon entropy of the sector shares over ln 8 [{@code sector_entropy}]
 * @param horizontalEdgeShare (sector 0 + sector 4) / n [{@code horizontal_edge_share}]
 * @param verticalEdgeShare (sector 2 + sector 6) / n [{@code vertical_edge_share}]
 * @param undefined for each null figure, its JSON key and why
 */
public record GripStatistics(
        int n,
        int undirected,
        Double resultantLength,
        Double meanDirectionDeg,
        Double circularVariance,
        Double circularSdDeg,
        Double rayleighZ,
        Double rayleighP,
        Double axialResultantLength,
        List<Integer> sectors,
        Double sectorEntropy,
        Double horizontalEdgeShare,
        Double verticalEdgeShare,
        Map<String, String> undefined) {}
