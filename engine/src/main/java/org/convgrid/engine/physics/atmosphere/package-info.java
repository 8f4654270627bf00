/** Surface boundary conditions from grey model atmospheres, tabulated over (Teff, g). */
package org.convgrid.engine.physics.atmosphere;
