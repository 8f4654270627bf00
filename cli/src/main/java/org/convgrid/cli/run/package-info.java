/** Grid runs behind the command line: run directories, resume, shards, merging, progress and the solver seam. */
package org.convgrid.cli.run;
