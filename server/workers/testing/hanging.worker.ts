/** Test double of the nesting worker: never answers, as an engine stuck past its budget would. */
setInterval(() => undefined, 1000);
