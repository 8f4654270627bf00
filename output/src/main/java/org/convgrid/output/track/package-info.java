/** Evolution-track files: one CSV row per accepted evolution step of one star. */
package org.convgrid.output.track;
