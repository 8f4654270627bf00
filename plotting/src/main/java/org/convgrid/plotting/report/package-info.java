/** The run's static HTML report page (opens offline: relative image links, inline CSS, no script). */
package org.convgrid.plotting.report;
