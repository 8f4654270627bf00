package org.convgrid.cli;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.Map;

/**
 * Why a path typed on the command line cannot be used, in words. The JDK refuses a path with a NUL, and one whose
 * characters its file-name encoding cannot write; that encoding comes from the locale, which is plain ASCII under
 * {@code LC_ALL=C} or {@code POSIX} (common under cron and batch systems), so "runs/c-locale ñ" was refused there as if
 * the name were at fault. The launcher runs the JVM under a UTF-8 locale in that case;
 * this names the locale for a JVM started otherwise.
 */
final class UnusablePath {

    private UnusablePath() {
    }

    /**
     * The reason for refusing {@code text}.
     *
     * @param fileNameEncoding the JVM's file-name encoding ({@code sun.jnu.encoding})
     * @param environment the process environment, for the locale variables it names
     */
    static String reason(String text, String fileNameEncoding, Map<String, String> environment) {
        if (text.indexOf('\0') >= 0) {
            return "not a usable path (it contains a NUL character)";
        }
        if (!isUtf8(fileNameEncoding) && !text.chars().allMatch(c -> c < 0x80)) {
            return "not a usable path: its non-ASCII characters cannot be written in this process's file-name "
                    + "encoding, " + fileNameEncoding + ", which comes from the locale (" + locale(environment)
                    + "); run under a UTF-8 locale, e.g. LC_ALL=C.UTF-8";
        }
        return "not a usable path (it contains a character the file system refuses)";
    }

    private static boolean isUtf8(String encoding) {
        try {
            return encoding != null && Charset.forName(encoding).equals(StandardCharsets.UTF_8);
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    /** The locale variables that decide the character set, as set: the first of LC_ALL, LC_CTYPE, LANG that is. */
    private static String locale(Map<String, String> environment) {
        for (String name : new String[] {"LC_ALL", "LC_CTYPE", "LANG"}) {
            String value = environment.get(name);
            if (value != null && !value.isEmpty()) {
                return name + "=" + value;
            }
        }
        return "no LC_ALL, LC_CTYPE or LANG set, so the C locale";
    }
}
