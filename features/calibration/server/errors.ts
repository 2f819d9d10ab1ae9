// The platform's refusal type answers in the API's error shape; calibration uses it as is.
export {
  ApiError as CalibrationError,
  forbidden,
  notFound,
  parseOrThrow,
} from "@/features/platform";
