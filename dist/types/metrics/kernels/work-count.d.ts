export declare const kernelWork: {
    visits: number;
    wordVisits: number;
};
/** Sets both counts back to zero. */
export declare function resetKernelWork(): void;
