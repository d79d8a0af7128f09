export declare const bridges: import("./types.js").Metric;
