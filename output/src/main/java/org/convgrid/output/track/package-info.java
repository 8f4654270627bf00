/**
 * Evolution-track files: one CSV row per accepted evolution step of one star; the writer and the reader share one
 * column list ({@link org.convgrid.output.track.TrackColumns}).
 */
package org.convgrid.output.track;
