/** Narrowing a transition between two model masses by bisection, with new models seeded from their neighbours. */
package org.convgrid.engine.refine;
