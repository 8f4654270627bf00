/**
 * Evolution from birth: the contracting, fully convective start model, the pre-main-sequence phase and the ages at
 * which a star's life changes.
 */
package org.convgrid.engine.birth;
