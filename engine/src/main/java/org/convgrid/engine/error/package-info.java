/** The engine's unchecked exception and its enumeration of failure kinds. */
package org.convgrid.engine.error;
