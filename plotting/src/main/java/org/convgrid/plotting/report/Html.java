package org.convgrid.plotting.report;

/** HTML text escaping for the report (element content and attribute values alike). */
final class Html {

    private Html() {
    }

    /** {@code text} with {@code & < > " '} escaped. */
    static String escape(String text) {
        StringBuilder b = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }
}
