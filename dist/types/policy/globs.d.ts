export interface GlobProblem {
    message: string;
    hint: string;
}
/** What is wrong with a glob, or undefined when it can select repository files. */
export declare function globProblem(glob: string): GlobProblem | undefined;
