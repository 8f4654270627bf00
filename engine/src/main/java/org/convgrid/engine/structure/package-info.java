/** The stellar-structure equations on a mass mesh and their solution by Henyey relaxation. */
package org.convgrid.engine.structure;
