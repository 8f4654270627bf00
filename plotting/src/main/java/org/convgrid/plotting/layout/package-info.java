/**
 * Where text goes on a chart: labels placed beside their points clear of every marker, line, box and other label,
 * with a leader line back to the point when a label had to move away. Pure geometry in screen pixels.
 */
package org.convgrid.plotting.layout;
