package org.variset.reports.pdf;

import org.variset.archive.problem.Remedy;

/**
 * What a document says a person can do: a PDF is read away from whichever front end wrote it, so it names the
 * archive's settings and actions, never a command or a button.
 */
final class DocumentWords {
    private DocumentWords() {}

    /** The remedy in a document's words, or empty when there is none. */
    static String remedy(Remedy r) {
        return switch (r.kind()) {
            case NONE -> "";
            case SET_TARGET ->
                "set the gym's own grade target for " + r.fact("discipline") + " routes in its settings (target)";
            case ALLOW_UPDATE -> "import the file again allowing updates";
            case REBUILD_INDEX -> "rebuild the search index";
            case CHECK_ARCHIVE -> "check the archive";
            default -> r.kind().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
        };
    }

    /** A sentence with its remedy after a colon; the sentence alone when there is none. */
    static String withRemedy(String sentence, Remedy r) {
        if (r.kind() == Remedy.Kind.NONE) {
            return sentence;
        }
        String s = sentence.endsWith(".") ? sentence.substring(0, sentence.length() - 1) : sentence;
        return s + ": " + remedy(r) + ".";
    }
}
