/**
 * Mixing beyond the formal boundaries of convective zones: the {@link Overshoot} interface and its schemes, which
 * read the previous model through {@link OvershootProfile}.
 */
package org.convgrid.engine.overshoot;
