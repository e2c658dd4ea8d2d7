export { BottomActionBar, type BottomActionBarProps } from "./bottom-action-bar";
export { Button, ButtonLink, buttonClasses, type ButtonLinkProps, type ButtonProps, type ButtonSize, type ButtonVariant } from "./button";
export { Card, CardLink, type CardLinkProps, type CardProps } from "./card";
export { Caution, type CautionProps } from "./caution";
export { cx } from "./cx";
export { Dialog, type DialogProps } from "./dialog";
export { EmptyState, type EmptyStateProps } from "./empty-state";
export {
  NumberWithUnitField,
  SelectField,
  TextField,
  type NumberWithUnitFieldProps,
  type SelectFieldProps,
  type SelectOption,
  type TextFieldProps,
} from "./field";
export * from "./icons";
export { PageHeader, type PageHeaderProps } from "./page-header";
export { RATIO_BAR_MAX, RatioBar, ratioVerdict, type RatioBarProps, type RatioVerdict } from "./ratio-bar";
export { Skeleton, Spinner, type SkeletonProps, type SpinnerProps } from "./spinner";
export { StatusBadge, type Status, type StatusBadgeProps } from "./status-badge";
export { ToastProvider, useToast, type ToastApi, type ToastOptions } from "./toast";
export { TradeText, type TradeTextProps } from "./trade-text";
