package org.convgrid.cli.run;

/**
 * Text from users or files on its way to the terminal: control characters (escape sequences that could move the
 * cursor, recolour or retitle the terminal, a NUL, a bell) are shown as '?', line ends and tabs kept.
 */
public final class TerminalText {

    private TerminalText() {
    }

    public static String clean(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(text.length());
        text.codePoints().forEach(c -> {
            boolean control = Character.getType(c) == Character.CONTROL || c == 0x2028 || c == 0x2029
                    || (c >= 0x202A && c <= 0x202E) || (c >= 0x2066 && c <= 0x2069);
            out.appendCodePoint(control && c != '\n' && c != '\t' ? '?' : c);
        });
        return out.toString();
    }
}
