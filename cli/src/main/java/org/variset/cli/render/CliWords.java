package org.variset.cli.render;

import java.io.PrintWriter;
import java.util.Arrays;
import java.util.stream.Collectors;
import org.variset.app.Notice;
import org.variset.app.Notices;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.problem.Remedy;
import org.variset.imports.ImportException;
import org.variset.imports.Problem;

/** The command line's words for remedies and for where an archive came from: the options it names are its own. */
public final class CliWords {
    private CliWords() {}

    /** A message with its remedy said the command line's way; the message alone when there is none. */
    public static String withRemedy(String message, Remedy remedy) {
        String m = message.endsWith(".") ? message.substring(0, message.length() - 1) : message;
        return switch (remedy.kind()) {
            case NONE -> message;
            case CREATE_ARCHIVE, CHECK_ARCHIVE, REBUILD_INDEX, CHOOSE_SCALE -> m + ". " + remedy(remedy);
            default -> m + "; " + remedy(remedy);
        };
    }

    /** What to do, naming this command line's commands and options. */
    public static String remedy(Remedy r) {
        return switch (r.kind()) {
            case NONE -> "";
            case REPLACE_EXISTING -> "give --force to replace it, or another name";
            case CREATE_ARCHIVE ->
                "Create one with: variset "
                        + (Boolean.parseBoolean(r.fact("shared"))
                                ? "--db '" + r.fact("where") + "'"
                                : "--archive " + r.fact("where"))
                        + " init";
            case CHECK_ARCHIVE -> "Run 'variset check' for details.";
            case REBUILD_INDEX -> "Run 'variset reindex' to build it again.";
            case NAME_GYM -> "name it with --gym";
            case LIST_RESETS -> "see 'variset resets' for the gym's reset labels";
            case ALLOW_UPDATE -> "see what it would change with --update --dry-run, then give --update";
            case SET_TARGET ->
                "set one with 'variset settings set target ... --discipline " + r.fact("discipline") + "'";
            case MERGE_SETTERS ->
                "to make the two one person, merge them: variset setter merge \"" + r.fact("from") + "\" \""
                        + r.fact("into") + "\"";
            case NARROW_ROUTE -> "say which with --wall and --set-on";
            case CHOOSE_SCOPE ->
                switch (r.fact("scope")) {
                    case "gym" -> "leave out --discipline and --wall";
                    case "discipline" -> "give --discipline boulder or --discipline rope";
                    default -> "give --discipline or --wall";
                };
            case CHOOSE_LOCATION ->
                r.fact("level").equals("given")
                        ? "give either --archive (an embedded archive) or --db (a shared one on a PostgreSQL server), "
                                + "not both"
                        : "or name the archive for this run with --db or --archive";
            case USE_SERVER_TOOLS ->
                "back up a PostgreSQL archive with the server's own tools (pg_dump and "
                        + "pg_restore, or the server's continuous archiving)";
            case NAME_EMBEDDED_ARCHIVE -> "name the embedded one with --archive DIR";
            case CHOOSE_SCALE ->
                "Choose with "
                        + Arrays.stream(r.fact("scales").split(", "))
                                .map(s -> "--scale " + s)
                                .collect(Collectors.joining(" or "))
                        + ".";
            case CONFIRM_NEW_NAME ->
                "write it as '" + r.fact("known") + "', or give --new-name '" + r.fact("name") + "' if it is another "
                        + r.fact("what");
        };
    }

    /** The problems of an import, each with its remedy, and how many more there were. */
    public static String problems(ImportException e) {
        StringBuilder b = new StringBuilder(
                e.count() + (e.count() == 1 ? " problem" : " problems") + " in the input; nothing was imported:");
        for (Problem p : e.problems()) {
            b.append("\n  ").append(problem(p));
        }
        if (e.count() > e.problems().size()) {
            b.append("\n  ... and ").append(e.count() - e.problems().size()).append(" more problems");
        }
        return b.toString();
    }

    /** One located problem, with its remedy in parentheses. */
    public static String problem(Problem p) {
        return p.remedy().kind() == Remedy.Kind.NONE ? p.toString() : p + " (" + remedy(p.remedy()) + ")";
    }

    /** Notices printed on a writer: {@code variset: warning: ...} for warnings, {@code variset: ...} otherwise. */
    public static Notices notices(PrintWriter err) {
        return n -> {
            err.println("variset: " + (n.kind() == Notice.Kind.WARNING ? "warning: " : "") + n.text());
            err.flush();
        };
    }

    /** Where a location came from, naming this command line's options for one given on it. */
    public static String origin(ArchiveLocation where) {
        return where.origin().kind() == ArchiveLocation.Origin.Kind.GIVEN
                ? (where.shared() ? "--db" : "--archive")
                : where.origin().describe();
    }
}
