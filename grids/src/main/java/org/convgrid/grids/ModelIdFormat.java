package org.convgrid.grids;

/**
 * Builds model ids from grid indices: {@code p<physics>-z<metallicity>-m<mass>-a<age>}, every index 0-based and
 * zero-padded to a width fixed by the axis size (at least 1, 2, 3 and 2 digits). Example: {@code p0-z01-m023-a02}.
 * The parts follow the grid order, so within one grid the ids sort lexicographically in grid order, and the same
 * grid always gives the same ids. The id without its age part ({@code p0-z01-m023}) names the evolution track.
 *
 * @param physicsWidth digits of the physics index
 * @param metallicityWidth digits of the metallicity index
 * @param massWidth digits of the mass index
 * @param ageWidth digits of the age index
 */
public record ModelIdFormat(int physicsWidth, int metallicityWidth, int massWidth, int ageWidth) {

    private static final String AGE_SEPARATOR = "-a";
    private static final String MASS_SEPARATOR = "-m";

    /** The format for axes of the given sizes. */
    public static ModelIdFormat forAxes(int physics, int metallicities, int masses, int ages) {
        return new ModelIdFormat(width(physics, 1), width(metallicities, 2), width(masses, 3), width(ages, 2));
    }

    /** The id of one model. */
    public String modelId(int physics, int metallicity, int mass, int age) {
        return trackId(physics, metallicity, mass) + AGE_SEPARATOR + pad(age, ageWidth);
    }

    /** The id of one evolution track (one mass, metallicity and physics; all ages). */
    public String trackId(int physics, int metallicity, int mass) {
        return "p" + pad(physics, physicsWidth) + "-z" + pad(metallicity, metallicityWidth)
                + MASS_SEPARATOR + pad(mass, massWidth);
    }

    /** The track id of a model id: the id without its age part. */
    public static String trackIdOf(String modelId) {
        int cut = modelId.lastIndexOf(AGE_SEPARATOR);
        if (cut < 0) {
            throw new IllegalArgumentException("'" + modelId + "' has no age part");
        }
        return modelId.substring(0, cut);
    }

    /**
     * A grid model's id without its mass part ({@code p0-z01-a02} of {@code p0-z01-m023-a02}): the same for every
     * mass of one slice (physics, metallicity and age). Null for an id with no mass part before its age part (a
     * refinement model's {@code -r<n>-} names no grid mass).
     */
    public static String sliceIdOf(String modelId) {
        int age = modelId.lastIndexOf(AGE_SEPARATOR);
        int mass = age < 0 ? -1 : modelId.lastIndexOf(MASS_SEPARATOR, age);
        if (mass < 0) {
            return null;
        }
        return modelId.substring(0, mass) + modelId.substring(age);
    }

    private static int width(int size, int minimum) {
        return Math.max(minimum, Integer.toString(Math.max(0, size - 1)).length());
    }

    private static String pad(int index, int width) {
        String digits = Integer.toString(index);
        return "0".repeat(Math.max(0, width - digits.length())) + digits;
    }
}
