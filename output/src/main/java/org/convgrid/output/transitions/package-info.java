/** Transition masses ({@code transitions.csv}): the fully convective limit and the convective-core onset per slice. */
package org.convgrid.output.transitions;
