/**
 * A picture picked on the device, ready for FormData: a File on the web; on a
 * phone the picker's file URI with its name and type (React Native's FormData
 * reads the file from the URI).
 */
export type PhotoFile = Blob | { uri: string; name: string; type: string; size?: number };
