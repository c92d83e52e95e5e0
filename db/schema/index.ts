export * from "./enums";
export * from "./accounts";
export * from "./gardens";
export * from "./beds";
export * from "./bins";
export * from "./activity";
