/** Rosseland-mean opacities from published analytic fits and from user tables. */
package org.convgrid.engine.physics.opacity;
