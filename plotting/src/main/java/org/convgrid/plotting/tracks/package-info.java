/** Evolution track files of a run (tracks/*.csv): one row per evolution step, read by column name. */
package org.convgrid.plotting.tracks;
