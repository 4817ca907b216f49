/** Test double of the nesting worker: dies on start, as a crashed engine would. */
throw new Error('simulated engine crash');
