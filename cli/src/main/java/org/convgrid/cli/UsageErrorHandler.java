package org.convgrid.cli;

import java.util.List;
import org.convgrid.cli.run.TerminalText;
import picocli.CommandLine;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;

/** Bad usage: one line naming the problem and where to read more, exit code 2. */
final class UsageErrorHandler implements IParameterExceptionHandler {

    private static final String PICOCLI_PREFIX = "Error: ";
    /** Close matches named at most, so that the line stays one line. */
    private static final int MAX_SUGGESTIONS = 4;

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine cmd = ex.getCommandLine();
        // picocli starts the messages of option groups with "Error: ", which our "convgrid: " prefix already says
        String message = ex.getMessage().startsWith(PICOCLI_PREFIX)
                ? ex.getMessage().substring(PICOCLI_PREFIX.length()) : ex.getMessage();
        // picocli's close matches to a mistyped option ('--age' for --age-myr), which its message leaves out
        String suggestions = "";
        if (ex instanceof CommandLine.UnmatchedArgumentException unmatched
                && !unmatched.getUnmatched().isEmpty()) {
            String typed = unmatched.getUnmatched().get(0);
            // the command's own option names (or subcommands, for a word): picocli's suggestions miss swapped keys
            java.util.Collection<String> names = typed.startsWith("-")
                    ? cmd.getCommandSpec().optionsMap().keySet() : cmd.getSubcommands().keySet();
            List<String> close = names.stream().filter(n -> n.startsWith("--") == typed.startsWith("--"))
                    .filter(n -> sharesAStart(typed, n)).distinct()
                    .sorted(java.util.Comparator.comparingInt((String n) -> edits(bare(typed), bare(n)))
                            .thenComparing(n -> n))
                    .limit(MAX_SUGGESTIONS).toList();
            if (!close.isEmpty()) {
                suggestions = "; did you mean " + String.join(", ", close) + "?";
            }
        }
        cmd.getErr().println("convgrid: " + TerminalText.clean(message) + suggestions + " (see '"
                + cmd.getCommandSpec().qualifiedName() + " --help')");
        return ExitCodes.USAGE;
    }

    /**
     * Whether a suggestion begins as the typed word does (dashes aside, at least {@link #COMMON_START} letters):
     * picocli's own matches include far ones ('nosuchcommand' drew "check, transitions").
     */
    static boolean sharesAStart(String typed, String suggestion) {
        String a = bare(typed);
        String b = bare(suggestion);
        int n = Math.min(COMMON_START, Math.min(a.length(), b.length()));
        // or a slip of a key or two ('satr', '--mxing-length'): two edits apart at most, one for a short word
        return n == COMMON_START && a.regionMatches(0, b, 0, n) || edits(a, b) <= (a.length() <= 3 ? 1 : MAX_EDITS);
    }

    /** A name without its dashes, in lower case. */
    private static String bare(String name) {
        return name.replace("-", "").toLowerCase(java.util.Locale.ROOT);
    }

    /** Edits (insert, delete, replace, swap of neighbours) between two words (optimal string alignment). */
    static int edits(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }

    /** Edits a mistyped word may be from a suggestion. */
    private static final int MAX_EDITS = 2;

    /** Letters a suggestion must share with the typed word's start. */
    private static final int COMMON_START = 3;
}
