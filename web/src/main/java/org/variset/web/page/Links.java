package org.variset.web.page;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;

/** The addresses of the pages, with their parameters encoded (names may hold spaces, slashes, anything). */
public final class Links {
    private Links() {}

    /** A wall's page. */
    public static String wall(String gym, String wall) {
        return "/wall?gym=" + enc(gym) + "&wall=" + enc(wall);
    }

    /** A reset's audit page. */
    public static String reset(String gym, String label) {
        return "/reset?gym=" + enc(gym) + "&label=" + enc(label);
    }

    /** A reset's audit as the PDF the command line writes. */
    public static String resetPdf(String gym, String label) {
        return "/reset.pdf?gym=" + enc(gym) + "&label=" + enc(label);
    }

    /** A route's page. */
    public static String route(long id) {
        return "/route?id=" + id;
    }

    /** A search. */
    public static String search(String query) {
        return "/search?q=" + enc(query);
    }

    static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }
}
