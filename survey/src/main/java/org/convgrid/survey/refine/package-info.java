/** Refinement of a finished run's transition masses by bisection with new models, and the rewritten tables. */
package org.convgrid.survey.refine;
