/** The offline experiment: read interactions and a taxonomy, train every model, evaluate, report. */
package org.congener.trainer.evaluation;
