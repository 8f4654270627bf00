/** The two convective transition masses against metallicity, one series per age, brackets as error bars. */
package org.convgrid.plotting.trend;
