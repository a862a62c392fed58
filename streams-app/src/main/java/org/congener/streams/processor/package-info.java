/** Processors of the suggestion topology: intake with dead letters, and suggestion computation. */
package org.congener.streams.processor;
