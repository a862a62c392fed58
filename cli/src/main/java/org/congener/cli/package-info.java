/** The one runnable, {@code congener}, and its subcommands. */
package org.congener.cli;
