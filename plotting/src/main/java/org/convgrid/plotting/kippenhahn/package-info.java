/** Convective zones and the hydrogen-burning region against age along one evolution track (Kippenhahn-style). */
package org.convgrid.plotting.kippenhahn;
