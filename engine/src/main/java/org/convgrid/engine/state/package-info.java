/** Immutable values describing the state of stellar matter: composition and the metal mixture. */
package org.convgrid.engine.state;
