/** The one pool of worker threads of a command, handing results back in task order whatever the thread count. */
package org.convgrid.survey.parallel;
