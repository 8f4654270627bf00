/** Zero-age main-sequence models, seeded by homology scaling from converged neighbours. */
package org.convgrid.engine.zams;
