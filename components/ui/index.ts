export { Alert, type AlertProps, type AlertTone } from "@/components/ui/alert";
export { Badge, type BadgeProps, type BadgeTone } from "@/components/ui/badge";
export {
  Button,
  buttonStyles,
  type ButtonProps,
  type ButtonSize,
  type ButtonVariant,
} from "@/components/ui/button";
export {
  Card,
  CardBody,
  CardHeader,
  CardTitle,
  type CardProps,
  type CardTitleProps,
} from "@/components/ui/card";
export { cn, type ClassValue } from "@/components/ui/cn";
export { ConfirmDialog, type ConfirmDialogProps } from "@/components/ui/confirm-dialog";
export { Dialog, type DialogProps } from "@/components/ui/dialog";
export { EmptyState, type EmptyStateProps } from "@/components/ui/empty-state";
export { Field, type FieldControlProps, type FieldProps } from "@/components/ui/field";
export {
  CautionIcon,
  ChevronDownIcon,
  CloseIcon,
  DangerIcon,
  InfoIcon,
  SpinnerIcon,
} from "@/components/ui/icons";
export { Input, type InputProps } from "@/components/ui/input";
export { Select, type SelectProps } from "@/components/ui/select";
export { Skeleton } from "@/components/ui/skeleton";
export { Table, TBody, Td, Th, THead, Tr, type TableProps } from "@/components/ui/table";
export { inlineLinkStyles, textLinkStyles } from "@/components/ui/text-link";
export { Textarea, type TextareaProps } from "@/components/ui/textarea";
export {
  TOAST_ACTION_DURATION_MS,
  TOAST_DURATION_MS,
  ToastProvider,
  useToast,
  type ToastApi,
  type ToastInput,
  type ToastTone,
} from "@/components/ui/toast";
