/** Reads interactions, trains and evaluates models, publishes model versions. */
package org.congener.trainer;
