package org.convgrid.engine.overshoot;

/**
 * Walks the convective zones of a profile (maximal runs of convective points) and locates their formal
 * boundaries: the sign change of the stability excess interpolated linearly between mesh points (common
 * practice). Shared by every overshoot scheme. Stateless.
 */
final class ConvectiveRuns {

    /** Receives one convective zone, points {@code first} to {@code last} inclusive. */
    @FunctionalInterface
    interface Zone {
        void accept(int first, int last);
    }

    private ConvectiveRuns() {
    }

    /** Calls {@code zone} for every convective zone of {@code p}, from the centre outwards. */
    static void forEach(OvershootProfile p, Zone zone) {
        int n = p.size();
        int k = 0;
        while (k < n) {
            if (!p.convective(k)) {
                k++;
                continue;
            }
            int end = lastOfZone(p, k);
            zone.accept(k, end);
            k = end + 1;
        }
    }

    /** The last point of the convective zone that starts at the convective point {@code first}. */
    static int lastOfZone(OvershootProfile p, int first) {
        int end = first;
        while (end + 1 < p.size() && p.convective(end + 1)) {
            end++;
        }
        return end;
    }

    /** Fraction of interval (k, k + 1) at which the stability excess changes sign (0.5 if it cannot tell). */
    private static double crossing(OvershootProfile p, int k) {
        double a = p.stabilityExcess(k);
        double b = p.stabilityExcess(k + 1);
        double f = a / (a - b);
        return Double.isFinite(f) && f >= 0.0 && f <= 1.0 ? f : 0.5;
    }

    /** Radius of the formal boundary in interval (k, k + 1), cm. */
    static double boundaryRadius(OvershootProfile p, int k) {
        double f = crossing(p, k);
        return p.radius(k) + f * (p.radius(k + 1) - p.radius(k));
    }

    /** Pressure scale height at the formal boundary in interval (k, k + 1), cm. */
    static double boundaryScaleHeight(OvershootProfile p, int k) {
        double f = crossing(p, k);
        return p.pressureScaleHeight(k) + f * (p.pressureScaleHeight(k + 1) - p.pressureScaleHeight(k));
    }
}
