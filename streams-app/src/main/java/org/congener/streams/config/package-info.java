/** Settings of the streams app: declared once, loaded from a file, the environment and flags. */
package org.congener.streams.config;
