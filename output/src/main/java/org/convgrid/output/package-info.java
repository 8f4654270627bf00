/** Run-directory files: shared CSV number format, atomic file replacement and the {@code lo-hi} span notation. */
package org.convgrid.output;
