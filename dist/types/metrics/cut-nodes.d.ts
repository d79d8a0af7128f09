export declare const cutNodes: import("./types.js").Metric;
