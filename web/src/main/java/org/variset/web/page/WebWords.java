package org.variset.web.page;

import org.variset.archive.problem.Remedy;

/** What to do about a problem, said the web workspace's way (its pages and forms, not the command line's options). */
public final class WebWords {
    private WebWords() {}

    /** A message with its remedy; the message alone when there is none. */
    public static String withRemedy(String message, Remedy remedy) {
        String r = remedy(remedy);
        if (r.isEmpty()) {
            return message;
        }
        String m = message.endsWith(".") ? message.substring(0, message.length() - 1) : message;
        return m + ". " + r;
    }

    /** What to do, naming this workspace's pages and forms. */
    public static String remedy(Remedy r) {
        return switch (r.kind()) {
            case NONE -> "";
            case REPLACE_EXISTING -> "Choose another name.";
            case CREATE_ARCHIVE -> "Create the archive first with 'variset init' on the server.";
            case CHECK_ARCHIVE -> "Ask whoever runs the server to run 'variset check'.";
            case REBUILD_INDEX -> "Ask whoever runs the server to run 'variset reindex'.";
            case NAME_GYM -> "Choose a gym (" + r.fact("gyms") + ").";
            case LIST_RESETS -> "The wall's page lists its resets.";
            case ALLOW_UPDATE ->
                "Tick \"Change routes the archive already holds\" and check the files again to see "
                        + "what would change.";
            case SET_TARGET -> "A head setter can set a grade target for " + r.fact("discipline") + " routes.";
            case MERGE_SETTERS ->
                "If they are one person, a head setter can merge \"" + r.fact("from") + "\" into \"" + r.fact("into")
                        + "\".";
            case NARROW_ROUTE -> "Open the route from its wall's page.";
            case CHOOSE_SCOPE -> "Choose the scope the setting applies to.";
            case CHOOSE_LOCATION, USE_SERVER_TOOLS, NAME_EMBEDDED_ARCHIVE ->
                "This is done on the server's command line.";
            case CHOOSE_SCALE -> "Write the grade with its scale (" + r.fact("scales") + ").";
            case CONFIRM_NEW_NAME ->
                "Write it as '" + r.fact("known") + "', or, if it is another " + r.fact("what") + ", add '"
                        + r.fact("name") + "' to \"New names to accept\" and check again.";
        };
    }
}
