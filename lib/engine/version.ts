// Bump the minor on any change that can move a rating or a cost for the same record and rates;
// the method id changes only when the severity method itself is redefined.
export const ENGINE_VERSION = "1.0.0";
export const SEVERITY_METHOD_ID = "gradeline-severity-v1";
