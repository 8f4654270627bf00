/** Evolution tracks as the charts use them: a track tied to the catalogue model it belongs to. */
package org.convgrid.plotting.tracks;
