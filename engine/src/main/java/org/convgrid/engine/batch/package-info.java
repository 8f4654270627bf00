/** Model requests and outcomes, and the scheduler that turns a list of requests into outcomes in grid order. */
package org.convgrid.engine.batch;
