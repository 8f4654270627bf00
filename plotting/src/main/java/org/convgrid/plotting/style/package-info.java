/** convgrid's one chart style (palette, fonts, markers, strokes) and the PNG/vector file output. */
package org.convgrid.plotting.style;
