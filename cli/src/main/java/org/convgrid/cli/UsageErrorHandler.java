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
            List<String> close = unmatched.getSuggestions().stream().filter(s -> sharesAStart(typed, s))
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
        String a = typed.replace("-", "").toLowerCase(java.util.Locale.ROOT);
        String b = suggestion.replace("-", "").toLowerCase(java.util.Locale.ROOT);
        int n = Math.min(COMMON_START, Math.min(a.length(), b.length()));
        return n == COMMON_START && a.regionMatches(0, b, 0, n);
    }

    /** Letters a suggestion must share with the typed word's start. */
    private static final int COMMON_START = 3;
}
