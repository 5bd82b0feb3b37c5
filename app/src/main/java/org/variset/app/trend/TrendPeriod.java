package org.variset.app.trend;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import org.variset.app.Document;
import org.variset.app.Workspace;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.reports.pdf.TrendPdf;
import org.variset.reports.trend.ChainComparison;
import org.variset.reports.trend.Trend;
import org.variset.reports.trend.TrendJson;
import org.variset.reports.trend.TrendReport;

/** Trends of one gym over a period, or of several gyms side by side (a chain on a shared archive). */
public final class TrendPeriod {
    private final Workspace workspace;

    /** Trends over a workspace's archive. */
    public TrendPeriod(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * Which gyms, over which days.
     *
     * @param gyms the gyms by name; empty for the only gym; ignored with {@code allGyms}
     * @param allGyms every gym of the archive
     * @param from the first day
     * @param to the last day, or null for today
     */
    public record Request(List<String> gyms, boolean allGyms, LocalDate from, LocalDate to) {
        /** A calendar year of the gyms named (none: the only gym). */
        public static Request year(int year, List<String> gyms, boolean allGyms) {
            return new Request(gyms, allGyms, LocalDate.of(year, 1, 1), LocalDate.of(year, 12, 31));
        }
    }

    /**
     * The trends.
     *
     * @param trends one per gym, in the order asked (by name for all gyms)
     * @param today the day wall status is reckoned on when the period reaches past it
     */
    public record Result(List<Trend> trends, LocalDate today) {
        /** True when several gyms are compared. */
        public boolean compared() {
            return trends.size() > 1;
        }

        /** The gyms side by side; only when {@link #compared()}. */
        public ChainComparison comparison() {
            return ChainComparison.of(trends);
        }

        /** The trend for scripts: one gym's, or the comparison then each gym's. */
        public ObjectNode json() {
            return compared() ? TrendJson.of(comparison(), trends) : TrendJson.of(trends.get(0));
        }

        /** The monthly series (one gym) or the comparison (several) as CSV (RFC 4180). */
        public String csv() {
            return compared() ? TrendJson.csv(comparison()) : TrendJson.csv(trends.get(0));
        }

        /** The trend report, or the chain report, as a PDF document. */
        public Document document() {
            return compared()
                    ? (options, out) -> TrendPdf.write(comparison(), trends, options, out)
                    : (options, out) -> TrendPdf.write(trends.get(0), options, out);
        }
    }

    /**
     * Computes the trends.
     *
     * @throws IllegalArgumentException for an unknown gym, an archive with no gym, or a period that ends before it
     *     starts
     */
    public Result run(Request r) {
        ArchiveCatalog catalog = new ArchiveCatalog(workspace.archive().connection());
        List<String> names = r.allGyms()
                ? catalog.gyms().stream().map(GymRecord::name).toList()
                : r.gyms().isEmpty() ? Collections.singletonList(null) : List.copyOf(new LinkedHashSet<>(r.gyms()));
        if (names.isEmpty()) {
            throw new IllegalArgumentException("the archive holds no gym yet; import some sets first");
        }
        LocalDate today = workspace.today(names.get(0));
        LocalDate to = r.to() == null ? today : r.to();
        TrendReport report = new TrendReport(workspace.archive().connection());
        List<Trend> trends = new ArrayList<>();
        for (String name : names) {
            trends.add(report.of(name, r.from(), to, today));
        }
        return new Result(List.copyOf(trends), today);
    }
}
