package org.convgrid.grids.words;

/**
 * A count with its noun in the right number: {@code 1 model}, {@code 2 models}. Messages said "1 models",
 * "1 thread(s)" and "1 model(s)"; readers noticed.
 */
public final class Counts {

    private Counts() {
    }

    /**
     * @param count how many
     * @param singular the noun for one (its plural adds an "s": model, thread, slice, bisection)
     */
    public static String of(long count, String singular) {
        return of(count, singular, singular + "s");
    }

    /**
     * @param count how many
     * @param singular the noun for one
     * @param plural the noun for any other count ("directories")
     */
    public static String of(long count, String singular, String plural) {
        return count + " " + noun(count, singular, plural);
    }

    /** The noun alone, for "1 of 1 model" where the count it agrees with is not the first. */
    public static String noun(long count, String singular, String plural) {
        return count == 1 ? singular : plural;
    }
}
