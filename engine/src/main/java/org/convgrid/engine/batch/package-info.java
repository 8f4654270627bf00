/**
 * The top of the engine: the grid's chunk solver (zero-age models and evolution to every requested age) and the
 * scheduler that turns a grid's requests into outcomes in grid order, whatever the thread count.
 */
package org.convgrid.engine.batch;
