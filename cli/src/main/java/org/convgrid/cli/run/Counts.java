package org.convgrid.cli.run;

/**
 * A count with its noun in the right number: {@code 1 model}, {@code 2 models}. Messages said "1 models" and
 * "1 thread(s)"; readers noticed.
 */
public final class Counts {

    private Counts() {
    }

    /**
     * @param count how many
     * @param singular the noun for one (its plural adds an "s": model, thread, slice, bisection)
     */
    public static String of(long count, String singular) {
        return count + " " + (count == 1 ? singular : singular + "s");
    }
}
